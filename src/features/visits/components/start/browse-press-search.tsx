import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import type { Customer } from '@shared/schemas/customer';
import type { Press } from '@shared/schemas/press';
import type { Site } from '@shared/schemas/site';
import { Button } from '@/components/ui/button';
import { SearchBox } from '@/components/ui/search-box';
import { customerListOptions } from '@/api/customers';
import { pressListOptions } from '@/api/presses';
import { siteListOptions } from '@/api/sites';
import { PICK_PAGE } from './pick-page';
import { PickList } from './pick-list';
import { PressChoiceList } from './press-choice-list';
import { SearchResults } from './search-results';

/** A step already taken (the customer, the site) and the way back to change it. */
function Chosen({ what, name, onChange }: { what: 'Customer' | 'Site'; name: string; onChange: () => void }) {
  return (
    <p className="flex flex-wrap items-center gap-3 text-lg text-ink">
      <span>
        {what}: <strong>{name}</strong>
      </span>
      <Button variant="quiet" onClick={onChange}>
        Change {what.toLowerCase()}
      </Button>
    </p>
  );
}

/** Customer, then site, then press: for when the asset tag is not to hand. */
export function BrowsePressSearch({ onChoose }: { onChoose: (press: Press) => void }) {
  const [customer, setCustomer] = useState<Customer | null>(null);
  const [site, setSite] = useState<Site | null>(null);
  const [q, setQ] = useState('');
  const customers = useQuery({ ...customerListOptions({ q, ...PICK_PAGE }), enabled: !customer });
  const sites = useQuery({ ...siteListOptions({ customerId: customer?.id ?? 0, q, ...PICK_PAGE }), enabled: customer !== null && !site });
  const presses = useQuery({ ...pressListOptions({ q, siteId: site?.id, ...PICK_PAGE }), enabled: site !== null });

  const back = (to: 'customer' | 'site') => {
    setQ('');
    setSite(null);
    if (to === 'customer') setCustomer(null);
  };

  return (
    <div className="space-y-3">
      {customer && <Chosen what="Customer" name={customer.name} onChange={() => back('customer')} />}
      {site && <Chosen what="Site" name={site.name} onChange={() => back('site')} />}
      {!customer ? (
        <>
          <SearchBox key="customer" label="Customer" value={q} onSearch={setQ} />
          <SearchResults query={customers} what="customers" empty="No customer matches. Check the spelling.">
            {(items) => <PickList items={items} label="Customers" onPick={(c) => {
                  setCustomer(c);
                  setQ('');
                }} />}
          </SearchResults>
        </>
      ) : !site ? (
        <>
          <SearchBox key="site" label="Site" value={q} onSearch={setQ} />
          <SearchResults query={sites} what="sites" empty="No site of this customer matches.">
            {(items) => <PickList items={items} label="Sites" onPick={(s) => {
                  setSite(s);
                  setQ('');
                }} describe={(s) => s.city} />}
          </SearchResults>
        </>
      ) : (
        <>
          <SearchBox key="press" label="Press at this site" value={q} onSearch={setQ} />
          <SearchResults query={presses} what="presses" empty="No press at this site matches.">
            {(items) => <PressChoiceList presses={items} onChoose={onChoose} label="Presses at this site" />}
          </SearchResults>
        </>
      )}
    </div>
  );
}
