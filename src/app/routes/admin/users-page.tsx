import { PageHeader } from '@/components/ui/page-header';
import { InviteUserForm } from '@/features/admin-users/components/invite-user-form';
import { UserList } from '@/features/admin-users/components/user-list';
import { useSessionUser } from '@/features/session/hooks/use-session-user';
import { useDocumentTitle } from '@/lib/use-document-title';

export function UsersPage() {
  useDocumentTitle('People and roles');
  const me = useSessionUser();
  return (
    <>
      <PageHeader title="People and roles" description="Invite people by e-mail, set their role, and deactivate accounts that should no longer sign in." />
      <div className="space-y-8">
        <InviteUserForm />
        <UserList currentUserId={me.id} />
      </div>
    </>
  );
}
