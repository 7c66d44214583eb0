import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { usersKeys } from '@/features/users/api/keys';

/** Sends the invite e-mail again with a fresh link (202); 409 `already_active` once a password is set. */
export const resendInvite = (id: string) => api.post<unknown>(`/api/users/${encodeURIComponent(id)}/invite`);

export function useResendInvite() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: resendInvite,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: usersKeys.all }),
  });
}
