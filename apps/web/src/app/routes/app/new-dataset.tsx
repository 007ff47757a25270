import { Flex, Heading, Text } from '@radix-ui/themes';
import { DocumentTitle } from '@/components/ui/document-title';
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
      <Flex direction="column" gap="1">
        <Heading as="h1" size="7">
          Import a dataset
        </Heading>
        <Text color="gray">
          A time series from a CSV file, for trend and comparison workings. Every row is typed on
          import; a file with a bad row is refused whole, with the line named.
        </Text>
      </Flex>
      <ImportDataset />
    </Flex>
  );
}
