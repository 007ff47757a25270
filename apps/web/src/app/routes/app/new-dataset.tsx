import { Flex } from '@radix-ui/themes';
import { DocumentTitle } from '@/components/ui/document-title';
import { PageHeader } from '@/components/ui/page-header';
import { useCurrentUser } from '@/features/auth/current-user';
import { ImportDataset } from '@/features/datasets/components/import/import-dataset';
import { datasetImportRoles, mayImportDataset } from '@/features/datasets/dataset-permissions';
import { navItem } from '../../nav-items';
import { NoAccess } from './no-access';

export function Component() {
  const user = useCurrentUser();
  if (!mayImportDataset(user.role)) {
    return (
      <NoAccess
        item={{ ...navItem('datasets'), label: 'Import a dataset', roles: datasetImportRoles }}
      />
    );
  }
  return (
    <Flex direction="column" gap="5" maxWidth="960px">
      <DocumentTitle title="Import a dataset" />
      <PageHeader
        title="Import a dataset"
        purpose="A time series from a CSV file, for trend and comparison workings. Every row is typed on import; a file with a bad row is refused whole, with the line named."
      />
      <ImportDataset />
    </Flex>
  );
}
