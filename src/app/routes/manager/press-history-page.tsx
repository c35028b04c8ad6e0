import { useParams } from 'react-router-dom';
import { PageShell } from '@/components/ui/page-shell';
import { PressHistory } from '@/features/figures/components/press-history';
import { NotFoundPage } from '../errors/not-found-page';
import { managerPaths } from './manager-paths';

export function PressHistoryPage() {
  const id = Number(useParams().id);
  if (!Number.isInteger(id) || id <= 0) return <NotFoundPage />;
  return (
    <PageShell title="Press history" description="Each reading across visits, against the band it was judged by: drift toward an edge shows before a failure.">
      <PressHistory pressId={id} recordHref={managerPaths.record} />
    </PageShell>
  );
}
