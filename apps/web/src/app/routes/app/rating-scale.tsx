import type { QueryClient } from '@tanstack/react-query';
import { DocumentTitle } from '@/components/ui/document-title';
import { sessionQueryOptions } from '@/features/auth/api/get-session';
import { useCurrentUser } from '@/features/auth/current-user';
import { ratingLevelsQueryOptions } from '@/features/rating-scale/api/get-rating-levels';
import { RatingScalePage } from '@/features/rating-scale/components/rating-scale-page';
import { mayOpen, navItem } from '../../nav-items';
import { NoAccess } from './no-access';

export const clientLoader = (queryClient: QueryClient) => async () => {
  const user = await queryClient.ensureQueryData(sessionQueryOptions());
  if (user && mayOpen(user.role, 'rating-scale')) {
    await queryClient.ensureQueryData(ratingLevelsQueryOptions());
  }
  return null;
};

export function Component() {
  const user = useCurrentUser();
  if (!mayOpen(user.role, 'rating-scale')) return <NoAccess item={navItem('rating-scale')} />;
  return (
    <>
      <DocumentTitle title="Rating scale" />
      <RatingScalePage mayEdit={user.role === 'desk_chief'} />
    </>
  );
}
