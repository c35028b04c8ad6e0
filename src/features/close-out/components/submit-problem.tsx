import { Link } from 'react-router-dom';
import { Banner } from '@/components/ui/banner';
import { Button, buttonVariants } from '@/components/ui/button';
import { errorMessage, isApiError } from '@/lib/api-error';

interface SubmitProblemProps {
  error: unknown;
  visitId: number;
  onRetry: () => void;
}

/** Why the close-out was not accepted, and the next move: retry, fix a field, or go back to the visit. */
export function SubmitProblem({ error, visitId, onRetry }: SubmitProblemProps) {
  const retry = (
    <Button variant="secondary" onClick={onRetry}>
      Retry
    </Button>
  );
  if (!isApiError(error) || error.status === 0 || error.status >= 500) {
    return (
      <Banner tone="error" role="alert" title="The close-out was not sent" action={retry}>
        <p>{errorMessage(error)}</p>
        <p>Everything you typed is still here. Press Retry when the connection is back; parts are not stored twice.</p>
      </Banner>
    );
  }
  if (error.status === 409) {
    return (
      <Banner
        tone="error"
        role="alert"
        title="The visit cannot be closed yet"
        action={
          <Link to={`/visits/${visitId}`} className={buttonVariants({ variant: 'secondary' })}>
            Back to the visit
          </Link>
        }
      >
        <p>{error.message}</p>
        <p>Go back to the visit, do what the message asks, then return to close it out. What you typed here is kept until you leave this page.</p>
      </Banner>
    );
  }
  const fieldsMarked = Object.keys(error.fields).length > 0;
  return (
    <Banner tone="error" role="alert" title="The close-out was not accepted">
      <p>{error.message}</p>
      {fieldsMarked && <p>Correct the fields marked ✕ above, then close the visit again.</p>}
    </Banner>
  );
}
