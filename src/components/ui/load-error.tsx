import { errorMessage, isForbidden, isUnauthorized } from '@/lib/api-error';
import { Banner } from './banner';
import { Button } from './button';

interface LoadErrorProps {
  error: unknown;
  /** What failed to load, e.g. "presses". */
  what: string;
  onRetry: () => void;
}

/** Why a list or record could not be shown, in the server's words, and what to do next. */
export function LoadError({ error, what, onRetry }: LoadErrorProps) {
  if (isForbidden(error)) {
    return (
      <Banner tone="error" role="alert" title="Not allowed">
        {errorMessage(error)}
      </Banner>
    );
  }
  const title = isUnauthorized(error) ? 'Your session has ended' : `Could not load ${what}`;
  return (
    <Banner
      tone="error"
      role="alert"
      title={title}
      action={
        isUnauthorized(error) ? undefined : (
          <Button variant="secondary" onClick={onRetry}>
            Try again
          </Button>
        )
      }
    >
      {errorMessage(error)}
    </Banner>
  );
}
