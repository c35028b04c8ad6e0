import { Link, useLocation } from 'react-router-dom';
import { buttonVariants } from '@/components/ui/button';
import { PageHeader } from '@/components/ui/page-header';
import { useSessionUser } from '@/features/session/hooks/use-session-user';
import { useDocumentTitle } from '@/lib/use-document-title';
import { ROLE_HOME } from '../../access';

export function NotFoundPage() {
  useDocumentTitle('Page not found');
  const { pathname } = useLocation();
  const user = useSessionUser();
  return (
    <>
      <PageHeader title="Page not found" description={`There is no page at ${pathname}. The link may be mistyped or out of date.`} />
      <Link to={ROLE_HOME[user.role]} className={buttonVariants({ variant: 'primary' })}>
        Go to your start page
      </Link>
    </>
  );
}
