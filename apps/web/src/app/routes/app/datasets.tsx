import type { QueryClient } from '@tanstack/react-query';
import { DocumentTitle } from '@/components/ui/document-title';
import { sessionQueryOptions } from '@/features/auth/api/get-session';
import { useCurrentUser } from '@/features/auth/current-user';
import { datasetsQueryOptions } from '@/features/datasets/api/get-datasets';
import { DatasetsIndex } from '@/features/datasets/components/datasets-index';
import { mayOpen, navItem } from '../../nav-items';
import { NoAccess } from './no-access';

export const clientLoader = (queryClient: QueryClient) => async () => {
  const user = await queryClient.ensureQueryData(sessionQueryOptions());
  // Started, not awaited: the page shows its own loading state.
  if (user && mayOpen(user.role, 'datasets'))
    void queryClient.prefetchQuery(datasetsQueryOptions());
  return null;
};

export function Component() {
  const user = useCurrentUser();
  if (!mayOpen(user.role, 'datasets')) return <NoAccess item={navItem('datasets')} />;
  return (
    <>
      <DocumentTitle title="Datasets" />
      <DatasetsIndex role={user.role} />
    </>
  );
}
