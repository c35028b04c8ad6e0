import { Link } from 'react-router-dom';
import { ROLE_LABELS, type Role } from '@shared/schemas/roles';
import { Banner } from '@/components/ui/banner';
import { buttonVariants } from '@/components/ui/button';
import { PageHeader } from '@/components/ui/page-header';
import { useDocumentTitle } from '@/lib/use-document-title';
import { ROLE_HOME } from '../../access';

const roleList = (roles: readonly Role[]) => roles.map((role) => ROLE_LABELS[role].toLowerCase()).join(' or ');

export function NotAllowed({ needed, current }: { needed: readonly Role[]; current: Role }) {
  useDocumentTitle('Not allowed');
  return (
    <>
      <PageHeader title="Not allowed" />
      <Banner tone="error" title={`This page needs the ${roleList(needed)} role.`}>
        You are signed in as {ROLE_LABELS[current].toLowerCase()}. Ask your administrator if you need access.
      </Banner>
      <Link to={ROLE_HOME[current]} className={buttonVariants({ variant: 'secondary', className: 'mt-6' })}>
        Go to your start page
      </Link>
    </>
  );
}
