import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { RedeemTokenInput, SessionUser } from '@shared/schemas/auth';
import { api } from '@/lib/api-client';
import { authKeys } from '@/features/auth/api/keys';

/** Sets the password from an invite or reset link; the person is signed in by the answer. */
export const redeemToken = (input: RedeemTokenInput) => api.post<{ user: SessionUser }>('/api/auth/redeem', input);

export function useRedeemToken() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: redeemToken,
    onSuccess: ({ user }) => {
      // Drop what a previous person may have left in memory, but keep the (now used) link's
      // description: the page showing it would otherwise refetch it and flash "link used".
      const linkTokens = authKeys.linkToken('')[1];
      queryClient.removeQueries({ predicate: (q) => q.queryKey[1] !== linkTokens });
      queryClient.setQueryData(authKeys.me(), user);
    },
  });
}
