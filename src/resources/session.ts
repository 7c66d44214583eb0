// The session resource: who is signed in (`/api/auth/session`), what an invite or reset link is for,
// and the writes that start, change and end a session.
import { queryOptions } from '@tanstack/react-query';
import type {
  ChangePasswordInput,
  ForgotPasswordInput,
  LinkToken,
  LoginInput,
  RedeemTokenInput,
  SessionAnswer,
  SessionUser,
} from '@shared/schemas/auth';
import { api } from '@/lib/api-client';

export const sessionKeys = {
  all: ['session'] as const,
  me: () => [...sessionKeys.all, 'me'] as const,
  linkTokens: () => [...sessionKeys.all, 'link-token'] as const,
  linkToken: (token: string) => [...sessionKeys.linkTokens(), token] as const,
};

/**
 * The signed-in user, or null when nobody is signed in. `/api/auth/session` answers 200 either
 * way, so a first load signed out shows no failed request in the browser's console.
 */
async function getMe(signal?: AbortSignal): Promise<SessionUser | null> {
  const { user } = await api.get<SessionAnswer>('/api/auth/session', { signal });
  return user;
}

export const sessionQueries = {
  me: () => queryOptions({ queryKey: sessionKeys.me(), queryFn: ({ signal }) => getMe(signal), staleTime: 5 * 60_000 }),
  /** What an invite or reset link is for; 404 `link_invalid` when it was used or has expired. */
  linkToken: (token: string) =>
    queryOptions({
      queryKey: sessionKeys.linkToken(token),
      queryFn: ({ signal }) => api.get<LinkToken>(`/api/auth/tokens/${encodeURIComponent(token)}`, { signal }),
      staleTime: Infinity,
      retry: false,
    }),
};

export const sessionRequests = {
  login: (input: LoginInput) => api.post<{ user: SessionUser }>('/api/auth/login', input),
  logout: () => api.post('/api/auth/logout'),
  /** 204 on success; 400 `wrong_password` or `weak_password` with the field named. */
  changePassword: (input: ChangePasswordInput) => api.post('/api/auth/password', input),
  /** Always 202, whether or not the address has an account (no way to probe for accounts). */
  requestPasswordReset: (input: ForgotPasswordInput) => api.post<{ message: string }>('/api/auth/forgot', input),
  /** Sets the password from an invite or reset link; the person is signed in by the answer. */
  redeemLinkToken: (input: RedeemTokenInput) => api.post<{ user: SessionUser }>('/api/auth/redeem', input),
};
