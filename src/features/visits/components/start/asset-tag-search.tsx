import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import type { Press } from '@shared/schemas/press';
import { SearchBox } from '@/components/ui/search-box';
import { pressListOptions } from '@/api/presses';
import { PICK_PAGE } from './pick-page';
import { PressChoiceList } from './press-choice-list';
import { SearchResults } from './search-results';

/** The quickest way at the machine: the asset tag painted on it. */
export function AssetTagSearch({ onChoose }: { onChoose: (press: Press) => void }) {
  const [q, setQ] = useState('');
  const presses = useQuery({ ...pressListOptions({ q, ...PICK_PAGE }), enabled: q !== '' });
  return (
    <div className="space-y-3">
      <SearchBox label="Asset tag" hint="Type the tag on the press, e.g. the first letters or digits" value={q} onSearch={setQ} />
      {q !== '' && (
        <SearchResults query={presses} what="presses" empty={`No press matches “${q}”. Check the tag, or find it by customer and site below.`}>
          {(items) => <PressChoiceList presses={items} onChoose={onChoose} label="Presses found by asset tag" />}
        </SearchResults>
      )}
    </div>
  );
}
