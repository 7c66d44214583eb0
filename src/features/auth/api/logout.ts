import { useMutation } from '@tanstack/react-query';
import { paths } from '@/config/paths';
import { api } from '@/lib/api-client';

export const logout = () => api.post('/api/auth/logout');

/**
 * Signs out, then loads the sign-in page afresh: nothing of the session stays in memory, which
 * matters on a phone or a desk shared by several people.
 */
export function useLogout() {
  return useMutation({
    mutationFn: logout,
    onSettled: () => {
      window.location.replace(paths.auth.signIn.getHref());
    },
  });
}
