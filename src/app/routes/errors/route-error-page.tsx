import { useRouteError } from 'react-router-dom';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { useDocumentTitle } from '@/lib/use-document-title';

/** Last resort when a screen fails to load or render (for example, after an update while offline). */
export function RouteErrorPage() {
  useDocumentTitle('Something went wrong');
  const error = useRouteError();
  console.error(error);
  return (
    <main className="mx-auto max-w-xl p-6">
      <Banner
        tone="error"
        role="alert"
        title="This screen could not be shown"
        action={<Button onClick={() => window.location.reload()}>Reload the page</Button>}
      >
        Reload the page. If it keeps happening, check the network connection and tell your administrator what you were doing.
      </Banner>
    </main>
  );
}
