import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Banner } from '@/components/ui/banner';
import { LoadError } from '@/components/ui/load-error';
import { Spinner } from '@/components/ui/spinner';
import { errorMessage } from '@/lib/api-error';
import { userListOptions } from '@/api/admin-users';
import { UserRow } from './user-row';

/** Every account with its role and status; a deactivated person is signed out everywhere at once. */
export function UserList({ currentUserId }: { currentUserId: number }) {
  const { data, error, isPending, isError, refetch } = useQuery(userListOptions());
  const [actionError, setActionError] = useState<unknown>(null);
  if (isPending) return <Spinner label="Loading people…" />;
  if (isError) return <LoadError error={error} what="people" onRetry={() => void refetch()} />;
  return (
    <div className="space-y-4">
      {actionError !== null && (
        <Banner tone="error" role="alert" title="That change was not made">
          {errorMessage(actionError)}
        </Banner>
      )}
      <p className="text-base text-ink-muted">Deactivating someone ends their sessions on every device straight away.</p>
      <div className="overflow-x-auto rounded-lg border border-surface-line bg-surface-raised">
        <table className="w-full min-w-[48rem] text-left">
          <thead>
            <tr className="text-base text-ink-muted">
              <th scope="col" className="p-3">Person</th>
              <th scope="col" className="p-3">Role</th>
              <th scope="col" className="p-3">Status</th>
              <th scope="col" className="p-3">Actions</th>
            </tr>
          </thead>
          <tbody>
            {data.map((user) => (
              <UserRow key={user.id} user={user} isSelf={user.id === currentUserId} onError={setActionError} />
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
