import { useMutation, useQueryClient, type QueryKey } from '@tanstack/react-query';

/**
 * A write that, once it succeeds, refreshes every screen showing what it changed: each key
 * (a resource's key factory, general or specific) is invalidated and awaited, so the caller's
 * `mutateAsync` resolves when the screens hold the new data.
 */
export function useWrite<TData, TVariables>(
  mutationFn: (variables: TVariables) => Promise<TData>,
  invalidates: readonly QueryKey[] | ((data: TData, variables: TVariables) => readonly QueryKey[]),
  /** Puts the answer into the cache first (e.g. a record's detail), before the refresh. */
  remember?: (data: TData, set: <T>(queryKey: QueryKey, value: T) => void) => void,
) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn,
    onSuccess: async (data, variables) => {
      remember?.(data, (queryKey, value) => queryClient.setQueryData(queryKey, value));
      const keys = typeof invalidates === 'function' ? invalidates(data, variables) : invalidates;
      await Promise.all(keys.map((queryKey) => queryClient.invalidateQueries({ queryKey })));
    },
  });
}
