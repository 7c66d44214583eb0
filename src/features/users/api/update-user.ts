import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { UpdateUserInput, UserSummary } from '@shared/schemas/auth';
import { api } from '@/lib/api-client';
import { usersKeys } from '@/features/users/api/keys';

/** Name, role, organisation, phone, and disabling or enabling the account. */
export const updateUser = ({ id, ...input }: UpdateUserInput & { id: string }) =>
  api.patch<UserSummary>(`/api/users/${encodeURIComponent(id)}`, input);

export function useUpdateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateUser,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: usersKeys.all }),
  });
}
