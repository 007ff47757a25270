import { Button, Card, Flex, Grid, Text } from '@radix-ui/themes';
import { claimantKindLabels, claimantKinds } from '@skyledger/contracts';
import { useEffect, useRef } from 'react';
import { useFormContext, useWatch } from 'react-hook-form';
import { ControlledSelect } from '@/components/ui/controlled-select';
import { TextAreaField } from '@/components/ui/text-area-field';
import { TextInputField } from '@/components/ui/text-input-field';
import { ClaimantSearch } from '@/features/claimants/components/claimant-search';
import type { FileClaimForm } from '../../forms/file-claim-form';

const kindOptions = claimantKinds.map((kind) => ({ value: kind, label: claimantKindLabels[kind] }));

/** Who made the claim: one the desk knows, found by name, or someone described anew. */
export function ClaimantChooser() {
  const {
    control,
    register,
    setValue,
    formState: { errors },
  } = useFormContext<FileClaimForm>();
  const [mode, picked] = useWatch({ control, name: ['claimantMode', 'picked'] });
  // The button that switched the mode is gone: focus goes on to the first field that came.
  const container = useRef<HTMLDivElement>(null);
  const switched = useRef(false);
  useEffect(() => {
    if (!switched.current) return;
    switched.current = false;
    container.current?.querySelector<HTMLElement>('input, textarea')?.focus();
  }, [mode]);
  const switchTo = (next: FileClaimForm['claimantMode']) => {
    switched.current = true;
    setValue('claimantMode', next);
  };

  if (mode === 'new') {
    return (
      <Flex direction="column" gap="4" ref={container}>
        <Grid columns={{ initial: '1', sm: '2' }} gap="4">
          <TextInputField
            label="Claimant's name"
            autoComplete="off"
            error={errors.newClaimant?.name?.message}
            {...register('newClaimant.name')}
          />
          <ControlledSelect
            control={control}
            name="newClaimant.kind"
            label="Kind of claimant"
            options={kindOptions}
            placeholder="Choose a kind"
            hint="Private individuals are never named on public pages unless a desk chief allows it"
          />
        </Grid>
        <TextInputField
          label="Affiliation (optional)"
          autoComplete="off"
          hint="e.g. a party, a company, a campaign"
          error={errors.newClaimant?.affiliation?.message}
          {...register('newClaimant.affiliation')}
        />
        <TextAreaField
          label="Notes on the claimant (optional)"
          rows={2}
          error={errors.newClaimant?.notes?.message}
          {...register('newClaimant.notes')}
        />
        <Flex>
          <Button
            type="button"
            variant="soft"
            color="gray"
            highContrast
            onClick={() => switchTo('existing')}
          >
            Find a claimant the desk knows instead
          </Button>
        </Flex>
      </Flex>
    );
  }

  return (
    <Flex direction="column" gap="3" ref={container}>
      {picked ? (
        <Card>
          <Flex justify="between" align="center" gap="3" wrap="wrap">
            <Flex direction="column">
              <Text size="1" color="gray">
                Claimant
              </Text>
              <Text weight="bold">{picked.name}</Text>
              <Text size="2" color="gray">
                {claimantKindLabels[picked.kind]}
                {picked.affiliation ? ` · ${picked.affiliation}` : ''}
              </Text>
            </Flex>
            <Button
              type="button"
              variant="soft"
              color="gray"
              highContrast
              onClick={() => setValue('picked', null)}
            >
              Choose someone else
            </Button>
          </Flex>
        </Card>
      ) : (
        <ClaimantSearch
          label="Find the claimant"
          hint="Type the start of a name, then choose"
          error={errors.picked?.message}
          onPick={(claimant) => setValue('picked', claimant, { shouldValidate: true })}
        />
      )}
      <Flex>
        <Button
          type="button"
          variant="soft"
          color="gray"
          highContrast
          onClick={() => switchTo('new')}
        >
          Someone new: describe the claimant
        </Button>
      </Flex>
    </Flex>
  );
}
