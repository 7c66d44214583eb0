import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { InviteUserInput, UserSummary } from '@shared/schemas/auth';
import { api } from '@/lib/api-client';
import { usersKeys } from '@/features/users/api/keys';

/** Creates the account and e-mails an invite link (201). */
export const inviteUser = (input: InviteUserInput) => api.post<UserSummary>('/api/users', input);

export function useInviteUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: inviteUser,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: usersKeys.all }),
  });
}
