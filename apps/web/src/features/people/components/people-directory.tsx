import { Flex } from '@radix-ui/themes';
import type { UserSortField } from '@skyledger/contracts';
import { useSearchParams } from 'react-router-dom';
import { parseUsersSort, useUsers, type UsersSort } from '../api/get-users';
import { CardsOrTable } from '@/components/ui/cards-or-table';
import { PageHeader } from '@/components/ui/page-header';
import { useShowNotice } from '@/components/ui/toaster';
import { InviteUserDialog } from './invite-user-dialog';
import { PeopleCards } from './people-cards';
import { PeopleTable } from './people-table';

// Dates read best newest first; names, e-mails, roles and statuses A to Z.
const firstOrder: Record<UserSortField, UsersSort['order']> = {
  displayName: 'asc',
  email: 'asc',
  role: 'asc',
  status: 'asc',
  createdAt: 'desc',
  lastSignInAt: 'desc',
};

export function PeopleDirectory({ currentUserId }: { currentUserId: string }) {
  const [searchParams, setSearchParams] = useSearchParams();
  const sort = parseUsersSort(searchParams);
  const { data } = useUsers(sort);
  const showNotice = useShowNotice();

  const shown = { users: data.items, sort, currentUserId, onNotice: showNotice };
  const show = (next: UsersSort) => setSearchParams({ sort: next.sort, order: next.order });
  const sortBy = (field: UserSortField) =>
    show({
      sort: field,
      order: sort.sort === field ? (sort.order === 'asc' ? 'desc' : 'asc') : firstOrder[field],
    });

  return (
    <Flex direction="column" gap="5">
      <PageHeader
        title="People"
        purpose={`${data.total === 1 ? '1 person' : `${data.total} people`} on the desk. Invite people, change their roles, and disable accounts that should no longer sign in.`}
        action={<InviteUserDialog onNotice={showNotice} />}
      />
      <CardsOrTable
        cards={<PeopleCards {...shown} onSort={show} />}
        table={<PeopleTable {...shown} onSort={sortBy} />}
      />
    </Flex>
  );
}
