import type { UserSummary } from '@shared/schemas/users';
import { Badge } from '@/components/ui/badge';

export function userStatusText(user: Pick<UserSummary, 'disabled' | 'invitePending'>) {
  if (user.disabled) return 'Disabled';
  if (user.invitePending) return 'Invite pending';
  return 'Active';
}

export function UserStatus({ user }: { user: Pick<UserSummary, 'disabled' | 'invitePending'> }) {
  const text = userStatusText(user);
  return <Badge tone={user.disabled ? 'neutral' : user.invitePending ? 'amber' : 'ink'}>{text}</Badge>;
}
