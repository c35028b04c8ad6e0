import type { AdminUser } from '@shared/schemas/admin-users';
import type { Role } from '@shared/schemas/roles';
import { Button } from '@/components/ui/button';
import { useResendInvite, useUpdateUser } from '@/api/admin-users';
import { RoleSelect } from './role-select';

const STATUS: Record<AdminUser['status'], { label: string; mark: string }> = {
  active: { label: 'Active', mark: '●' },
  invited: { label: 'Invited', mark: '◐' },
  deactivated: { label: 'Deactivated', mark: '○' },
};
const day = (iso: string) => new Date(iso).toLocaleDateString(undefined, { month: 'short', day: 'numeric' });

/** One account: role, status with a shape beside the word, and what an administrator can do next. */
export function UserRow({ user, isSelf, onError }: { user: AdminUser; isSelf: boolean; onError: (error: unknown) => void }) {
  const update = useUpdateUser();
  const resend = useResendInvite();
  const busy = update.isPending || resend.isPending;
  const change = (c: { role?: Role; active?: boolean }) => update.mutate({ id: user.id, change: c }, { onError });

  return (
    <tr className="border-t border-surface-line align-top">
      <td className="p-3">
        <p className="text-lg font-semibold text-ink">{user.name}</p>
        <p className="text-base text-ink-muted">{user.email}</p>
      </td>
      <td className="p-3">
        <RoleSelect aria-label={`Role of ${user.name}`} value={user.role} disabled={isSelf || busy} onChange={(e) => change({ role: e.target.value as Role })} />
      </td>
      <td className="p-3 text-lg text-ink">
        <span aria-hidden="true">{STATUS[user.status].mark} </span>
        {STATUS[user.status].label}
        {user.invite && (
          <p className="text-base text-ink-muted">
            {user.invite.expired ? `Link expired ${day(user.invite.expiresAt)}` : `Sent ${day(user.invite.sentAt)}, open until ${day(user.invite.expiresAt)}`}
          </p>
        )}
      </td>
      <td className="p-3">
        {isSelf ? (
          <span className="text-base text-ink-muted">This is you</span>
        ) : (
          <div className="flex flex-wrap gap-2">
            {user.status === 'active' && (
              <Button variant="secondary" disabled={busy} onClick={() => change({ active: false })} aria-label={`Deactivate ${user.name}`}>
                Deactivate
              </Button>
            )}
            {user.status === 'invited' && (
              <>
                <Button variant="secondary" disabled={busy} onClick={() => resend.mutate(user.id, { onError })} aria-label={`Resend the invitation to ${user.name}`}>
                  Resend invitation
                </Button>
                <Button variant="quiet" disabled={busy} onClick={() => change({ active: false })} aria-label={`Withdraw the invitation to ${user.name}`}>
                  Withdraw
                </Button>
              </>
            )}
            {user.status === 'deactivated' && (
              <Button variant="secondary" disabled={busy} onClick={() => change({ active: true })} aria-label={`Reactivate ${user.name}`}>
                Reactivate
              </Button>
            )}
          </div>
        )}
      </td>
    </tr>
  );
}
