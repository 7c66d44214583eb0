/** Query keys of the search feature. */
export const searchKeys = {
  all: ['search'] as const,
  results: (q: string) => [...searchKeys.all, q.trim()] as const,
};
