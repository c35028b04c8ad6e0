import { Link } from 'react-router-dom';
import { Banner } from '@/components/ui/banner';
import { buttonVariants } from '@/components/ui/button';
import type { CloseOutBlocker } from '../utils/close-out-blocker';

/** The close-out refused politely, with the way back to the visit. */
export function CloseOutBlocked({ blocker, visitId }: { blocker: CloseOutBlocker; visitId: number }) {
  return (
    <Banner
      title={blocker.title}
      action={
        <Link to={`/visits/${visitId}`} className={buttonVariants({ variant: 'primary', size: 'lg' })}>
          Back to the visit
        </Link>
      }
    >
      {blocker.message}
    </Banner>
  );
}
