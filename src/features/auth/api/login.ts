import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { LoginInput, SessionUser } from '@shared/schemas/auth';
import { api } from '@/lib/api-client';
import { authKeys } from '@/features/auth/api/keys';

export const login = (input: LoginInput) => api.post<{ user: SessionUser }>('/api/auth/login', input);

/** Signs in; anything cached for a previous person is dropped first. */
export function useLogin() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: login,
    onSuccess: ({ user }) => {
      queryClient.removeQueries();
      queryClient.setQueryData(authKeys.me(), user);
    },
  });
}
