import { infiniteQueryOptions, keepPreviousData, useInfiniteQuery } from '@tanstack/react-query';
import type { UserSummary } from '@shared/schemas/auth';
import type { Page } from '@shared/schemas/common';
import { api } from '@/lib/api-client';
import { usersKeys, type UserFilters } from '@/features/users/api/keys';

export const usersPageSize = 50;

export const getUsers = (filters: UserFilters & { cursor?: string; limit?: number }, signal?: AbortSignal) =>
  api.get<Page<UserSummary>>('/api/users', { query: { limit: usersPageSize, ...filters }, signal });

export const usersInfiniteQueryOptions = (filters: UserFilters) =>
  infiniteQueryOptions({
    queryKey: usersKeys.list(filters),
    queryFn: ({ pageParam, signal }) => getUsers({ ...filters, cursor: pageParam }, signal),
    initialPageParam: undefined as string | undefined,
    getNextPageParam: (last) => last.nextCursor ?? undefined,
  });

/** Pages of people with an account; keeps the last rows on screen while a new filter loads. */
export const useUsers = (filters: UserFilters) =>
  useInfiniteQuery({ ...usersInfiniteQueryOptions(filters), placeholderData: keepPreviousData });
