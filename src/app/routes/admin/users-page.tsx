import { PageShell } from '@/components/ui/page-shell';
import { InviteUserForm } from '@/features/admin-users/components/invite-user-form';
import { UserList } from '@/features/admin-users/components/user-list';
import { useSessionUser } from '@/features/session/hooks/use-session-user';

export function UsersPage() {
  const me = useSessionUser();
  return (
    <PageShell title="People and roles" description="Invite people by e-mail, set their role, and deactivate accounts that should no longer sign in.">
      <div className="space-y-8">
        <InviteUserForm />
        <UserList currentUserId={me.id} />
      </div>
    </PageShell>
  );
}
