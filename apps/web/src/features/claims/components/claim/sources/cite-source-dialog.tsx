import { PlusIcon } from '@radix-ui/react-icons';
import { Box, Button, Dialog, Flex, Tabs } from '@radix-ui/themes';
import type { SourceView } from '@skyledger/contracts';
import { useState } from 'react';
import { FormError } from '@/components/ui/form-error';
import type { ShowNotice } from '@/components/ui/toaster';
import { changeErrorMessage } from '@/lib/api-error-messages';
import { useLinkSource } from '../../../api/link-source';
import { staleClaimMessage } from '../claim-messages';
import { NewSourceForm } from './new-source-form';
import { SourceSearch } from './source-search';

/** Cites a source for the claim: one the desk already has, or a new one described here. */
export function CiteSourceDialog({ claimId, onNotice }: { claimId: string; onNotice: ShowNotice }) {
  const [open, setOpen] = useState(false);
  const [error, setError] = useState<string | undefined>();
  const link = useLinkSource(claimId);
  const cited = (title: string) => {
    setOpen(false);
    onNotice({ tone: 'success', text: `“${title}” is cited for this claim.` });
  };
  const citeExisting = (source: SourceView) =>
    link.mutate(
      { sourceId: source.id },
      {
        onSuccess: () => cited(source.title),
        onError: (cause) => setError(changeErrorMessage(cause, staleClaimMessage)),
      },
    );

  return (
    <Dialog.Root
      open={open}
      onOpenChange={(next) => {
        setOpen(next);
        setError(undefined);
      }}
    >
      <Dialog.Trigger>
        <Button highContrast>
          <PlusIcon aria-hidden />
          Cite a source
        </Button>
      </Dialog.Trigger>
      <Dialog.Content maxWidth="640px">
        <Dialog.Title>Cite a source</Dialog.Title>
        <Dialog.Description size="2" mb="3">
          Sources are shared between claims: cite one the desk already has, or describe a new one
          with its grade.
        </Dialog.Description>
        <Tabs.Root defaultValue="existing" onValueChange={() => setError(undefined)}>
          <Tabs.List aria-label="Which source">
            <Tabs.Trigger value="existing">One the desk has</Tabs.Trigger>
            <Tabs.Trigger value="new">A new source</Tabs.Trigger>
          </Tabs.List>
          <Box pt="4">
            <Tabs.Content value="existing">
              <Flex direction="column" gap="3">
                <FormError message={error} />
                <SourceSearch
                  onCite={citeExisting}
                  citing={
                    link.isPending && 'sourceId' in link.variables ? link.variables.sourceId : null
                  }
                />
                <Flex justify="end">
                  <Dialog.Close>
                    <Button type="button" variant="soft" color="gray" highContrast>
                      Cancel
                    </Button>
                  </Dialog.Close>
                </Flex>
              </Flex>
            </Tabs.Content>
            <Tabs.Content value="new">
              <NewSourceForm link={link} onCited={cited} />
            </Tabs.Content>
          </Box>
        </Tabs.Root>
      </Dialog.Content>
    </Dialog.Root>
  );
}
