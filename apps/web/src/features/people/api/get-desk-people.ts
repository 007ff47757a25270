import type { DeskPerson } from '@skyledger/contracts';
import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { userKeys } from './user-keys';

/** Active people on the desk, names and roles only: for assignee pickers and filters. */
export function getDeskPeople(): Promise<DeskPerson[]> {
  return api.get<DeskPerson[]>('/people');
}

export const deskPeopleQueryOptions = () =>
  queryOptions({
    queryKey: userKeys.deskPeople(),
    queryFn: getDeskPeople,
    staleTime: 5 * 60_000,
  });

export function useDeskPeople() {
  return useSuspenseQuery(deskPeopleQueryOptions());
}
