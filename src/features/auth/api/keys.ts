/** Query keys of the auth feature, general to specific. */
export const authKeys = {
  all: ['auth'] as const,
  me: () => [...authKeys.all, 'me'] as const,
  linkToken: (token: string) => [...authKeys.all, 'link-token', token] as const,
};
