import {
  sortOrders,
  userSortFields,
  type SortOrder,
  type UserSortField,
  type UsersListResponse,
} from '@skyledger/contracts';
import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '@/lib/api-client';
import { userKeys } from './user-keys';

export interface UsersSort {
  sort: UserSortField;
  order: SortOrder;
}

export const defaultUsersSort: UsersSort = { sort: 'displayName', order: 'asc' };

const usersSortSchema = z.object({
  sort: z.enum(userSortFields).catch(defaultUsersSort.sort),
  order: z.enum(sortOrders).catch(defaultUsersSort.order),
});

/** The sort in the page's URL (`?sort=email&order=desc`); anything unknown falls back. */
export function parseUsersSort(searchParams: URLSearchParams): UsersSort {
  return usersSortSchema.parse({
    sort: searchParams.get('sort') ?? undefined,
    order: searchParams.get('order') ?? undefined,
  });
}

export function getUsers({ sort, order }: UsersSort): Promise<UsersListResponse> {
  return api.get<UsersListResponse>('/users', { params: { sort, order } });
}

export const usersQueryOptions = (sort: UsersSort) =>
  queryOptions({
    queryKey: userKeys.list(sort),
    queryFn: () => getUsers(sort),
  });

export function useUsers(sort: UsersSort) {
  return useSuspenseQuery(usersQueryOptions(sort));
}
