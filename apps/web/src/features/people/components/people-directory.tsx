import { Box, Flex, Text } from '@radix-ui/themes';
import type { UserSortField } from '@skyledger/contracts';
import { useSearchParams } from 'react-router-dom';
import { parseUsersSort, useUsers, type UsersSort } from '../api/get-users';
import { InviteUserDialog } from './invite-user-dialog';
import { useShowNotice } from '@/components/ui/toaster';
import { PageHeader } from '@/components/ui/page-header';
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

  const sortBy = (field: UserSortField) => {
    const order = sort.sort === field ? (sort.order === 'asc' ? 'desc' : 'asc') : firstOrder[field];
    setSearchParams({ sort: field, order });
  };

  return (
    <Flex direction="column" gap="5">
      <PageHeader
        title="People"
        purpose={`${data.total === 1 ? '1 person' : `${data.total} people`} on the desk. Invite people, change their roles, and disable accounts that should no longer sign in.`}
        action={<InviteUserDialog onNotice={showNotice} />}
      />
      <Box display={{ initial: 'block', md: 'none' }}>
        <Text size="1" color="gray">
          The table scrolls sideways for role, status and actions.
        </Text>
      </Box>
      <PeopleTable
        users={data.items}
        sort={sort}
        onSort={sortBy}
        currentUserId={currentUserId}
        onNotice={showNotice}
      />
    </Flex>
  );
}
