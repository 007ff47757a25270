import { UpdateIcon } from '@radix-ui/react-icons';
import { Button, Flex } from '@radix-ui/themes';
import type { SearchReindexResponse } from '@skyledger/contracts';
import { useShowNotice } from '@/components/ui/toaster';
import { errorMessage } from '@/lib/api-error-messages';
import { useReindexSearch } from '../api/reindex-search';

const count = new Intl.NumberFormat('en-GB');

function describeRebuild({ documents, milliseconds }: SearchReindexResponse): string {
  const took = milliseconds < 1000 ? `${milliseconds} ms` : `${(milliseconds / 1000).toFixed(1)} s`;
  return `The index is rebuilt: ${count.format(documents)} ${documents === 1 ? 'document' : 'documents'} in ${took}.`;
}

/** The desk chief's rebuild of the search index from the database, with what it did. */
export function ReindexButton() {
  const reindex = useReindexSearch();
  const showNotice = useShowNotice();
  return (
    <Flex direction="column" gap="2" align={{ initial: 'start', sm: 'end' }}>
      <Button
        variant="soft"
        color="gray"
        highContrast
        loading={reindex.isPending}
        onClick={() => {
          reindex.mutate(undefined, {
            onSuccess: (result) => showNotice({ tone: 'success', text: describeRebuild(result) }),
            onError: (error) => showNotice({ tone: 'problem', text: errorMessage(error) }),
          });
        }}
      >
        <UpdateIcon aria-hidden />
        Rebuild the index
      </Button>
    </Flex>
  );
}
