import type { QueryClient } from '@tanstack/react-query';
import { uuidSchema } from '@skyledger/contracts';
import { data, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { sessionQueryOptions } from '@/features/auth/api/get-session';
import { useCurrentUser } from '@/features/auth/current-user';
import { datasetQueryOptions } from '@/features/datasets/api/get-dataset';
import { DatasetView } from '@/features/datasets/components/dataset-view';
import { isApiError } from '@/lib/api-client';
import { mayOpen, navItem } from '../../nav-items';
import { NoAccess } from './no-access';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const user = await queryClient.ensureQueryData(sessionQueryOptions());
    if (!user || !mayOpen(user.role, 'datasets')) return null;
    const datasetId = params.datasetId ?? '';
    // An address that names no dataset is a page that does not exist, not a failed page.
    if (!uuidSchema.safeParse(datasetId).success) throw data(null, { status: 404 });
    await queryClient.ensureQueryData(datasetQueryOptions(datasetId)).catch((error: unknown) => {
      throw isApiError(error) && error.status === 404 ? data(null, { status: 404 }) : error;
    });
    return null;
  };

export function Component() {
  const user = useCurrentUser();
  const { datasetId = '' } = useParams();
  if (!mayOpen(user.role, 'datasets')) return <NoAccess item={navItem('datasets')} />;
  return <DatasetView key={datasetId} datasetId={datasetId} />;
}
