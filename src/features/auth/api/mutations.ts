// The session's writes: signing in and out, a new password, a reset link.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { paths } from '@/config/paths';
import { useWrite } from '@/lib/mutation';
import { sessionKeys, sessionRequests } from '@/resources/session';

const isLinkToken = (queryKey: readonly unknown[]) => sessionKeys.linkTokens().every((part, i) => queryKey[i] === part);

/** Signs in; anything cached for a previous person is dropped first. */
export function useLogin() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: sessionRequests.login,
    onSuccess: ({ user }) => {
      queryClient.removeQueries();
      queryClient.setQueryData(sessionKeys.me(), user);
    },
  });
}

/**
 * Signs out, then loads the sign-in page afresh: nothing of the session stays in memory, which
 * matters on a phone or a desk shared by several people.
 */
export function useLogout() {
  return useMutation({
    mutationFn: sessionRequests.logout,
    onSettled: () => {
      window.location.replace(paths.auth.signIn.getHref());
    },
  });
}

/** Sets the password from an invite or reset link; the person is signed in by the answer. */
export function useRedeemToken() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: sessionRequests.redeemLinkToken,
    onSuccess: ({ user }) => {
      // Drop what a previous person may have left in memory, but keep the (now used) link's
      // description: the page showing it would otherwise refetch it and flash "link used".
      queryClient.removeQueries({ predicate: (q) => !isLinkToken(q.queryKey) });
      queryClient.setQueryData(sessionKeys.me(), user);
    },
  });
}

/** A new password: every other browser is signed out, this one carries on (nothing cached changes). */
export const useChangePassword = () => useWrite(sessionRequests.changePassword, []);
/** Asks for a reset link (the answer is the same whether or not the address has an account). */
export const useForgotPassword = () => useWrite(sessionRequests.requestPasswordReset, []);
