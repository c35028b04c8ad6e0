import { Outlet } from 'react-router-dom';
import type { Role } from '@shared/schemas/roles';
import { useSessionUser } from '@/features/session/hooks/use-session-user';
import { NotAllowed } from '../routes/errors/not-allowed';

/** Lets only the listed roles through; the server enforces the same rule on every call. */
export function RequireRole({ roles }: { roles: readonly Role[] }) {
  const user = useSessionUser();
  if (!roles.includes(user.role)) return <NotAllowed needed={roles} current={user.role} />;
  return <Outlet />;
}
