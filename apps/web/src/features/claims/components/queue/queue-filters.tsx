import { zodResolver } from '@hookform/resolvers/zod';
import { Box, Button, Card, Flex, Grid, Text } from '@radix-ui/themes';
import {
  roleLabels,
  type ClaimantView,
  type ClaimQueueQuery,
  type Role,
} from '@skyledger/contracts';
import { useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { ControlledCheckbox } from '@/components/ui/controlled-checkbox';
import { ControlledSelect } from '@/components/ui/controlled-select';
import { TextInputField } from '@/components/ui/text-input-field';
import { ClaimantSearch } from '@/features/claimants/components/claimant-search';
import { useDeskPeople } from '@/features/people/api/get-desk-people';
import { hasClaimRole } from '../../claim-permissions';
import {
  noFilters,
  queueFilterFormSchema,
  toFilterForm,
  toQueueFilters,
  type QueueFilterForm,
  type QueueFilters as Filters,
} from './queue-filter-form';

interface QueueFiltersProps {
  query: ClaimQueueQuery;
  role: Role;
  /** The name of the claimant filtered on, when the page knows it. */
  claimantName: string | undefined;
  onApply: (filters: Filters) => void;
  /** Tells the page the name of a claimant picked here, which the URL holds only by id. */
  onClaimantPicked: (claimant: ClaimantView) => void;
}

const legalOptions = [
  { value: 'any', label: 'Flagged or not' },
  { value: 'yes', label: 'Flagged for legal review' },
  { value: 'no', label: 'Not flagged' },
] as const;

/** The queue's filters; applying them writes the URL, so a view can be shared. */
export function QueueFilters({
  query,
  role,
  claimantName,
  onApply,
  onClaimantPicked,
}: QueueFiltersProps) {
  const { data: people } = useDeskPeople();
  const {
    register,
    control,
    handleSubmit,
    setValue,
    formState: { errors },
  } = useForm<QueueFilterForm>({
    resolver: zodResolver(queueFilterFormSchema),
    defaultValues: toFilterForm(query),
  });
  const assigneeOptions = [
    { value: 'any', label: 'Anyone or nobody' },
    { value: 'none', label: 'Nobody yet' },
    ...people
      .filter((person) => hasClaimRole(person.role, 'assignable'))
      .map((person) => ({
        value: person.id,
        label: `${person.displayName} (${roleLabels[person.role].toLowerCase()})`,
      })),
  ];
  const claimant = useWatch({ control, name: 'claimant' });
  const apply = handleSubmit((form) => onApply(toQueueFilters(queueFilterFormSchema.parse(form))));
  // On a phone the filters wait behind a button, so the claims come first on the screen.
  const [shownOnPhone, setShownOnPhone] = useState(false);
  const set = (Object.keys(noFilters) as (keyof Filters)[]).filter(
    (key) => query[key] !== undefined,
  ).length;

  return (
    <Flex direction="column" gap="3">
      <Box display={{ initial: 'block', md: 'none' }}>
        <Button
          type="button"
          variant="soft"
          color="gray"
          highContrast
          aria-expanded={shownOnPhone}
          aria-controls="queue-filters"
          onClick={() => setShownOnPhone((shown) => !shown)}
        >
          {shownOnPhone ? 'Hide the filters' : 'Filter the queue'}
          {set ? ` (${set} set)` : ''}
        </Button>
      </Box>
      <Box id="queue-filters" display={{ initial: shownOnPhone ? 'block' : 'none', md: 'block' }}>
        <Card size="2">
          <form aria-label="Filter the queue" noValidate onSubmit={apply}>
            <Flex direction="column" gap="4">
              <Grid columns={{ initial: '1', sm: '2', md: '3' }} gap="4">
                <ControlledSelect
                  control={control}
                  name="assignee"
                  label="Researched by"
                  options={assigneeOptions}
                />
                <TextInputField
                  label="Topic"
                  hint="One topic tag, e.g. sea-level"
                  autoComplete="off"
                  error={errors.topic?.message}
                  {...register('topic')}
                />
                <ControlledSelect
                  control={control}
                  name="legal"
                  label="Legal review"
                  options={legalOptions}
                />
                <TextInputField
                  label="Filed from"
                  type="date"
                  error={errors.filedFrom?.message}
                  {...register('filedFrom')}
                />
                <TextInputField
                  label="Filed to"
                  type="date"
                  hint="The whole of this day counts"
                  error={errors.filedTo?.message}
                  {...register('filedTo')}
                />
                <ControlledCheckbox
                  control={control}
                  name="mine"
                  label="Only mine"
                  hint={role === 'reporter' ? 'Claims you filed' : 'Claims you are researching'}
                />
              </Grid>
              {claimant ? (
                <Flex gap="3" align="center" wrap="wrap">
                  <Text size="2">
                    Claimant: <Text weight="bold">{claimantName ?? 'the one chosen'}</Text>
                  </Text>
                  <Button
                    type="button"
                    size="1"
                    variant="soft"
                    color="gray"
                    highContrast
                    onClick={() => setValue('claimant', '')}
                  >
                    Any claimant
                  </Button>
                </Flex>
              ) : (
                <ClaimantSearch
                  label="Claimant"
                  hint="Type the start of a name, then choose"
                  onPick={(picked) => {
                    onClaimantPicked(picked);
                    setValue('claimant', picked.id);
                    void apply();
                  }}
                />
              )}
              <Flex gap="3" wrap="wrap">
                <Button type="submit" highContrast>
                  Apply filters
                </Button>
                <Button
                  type="button"
                  variant="soft"
                  color="gray"
                  highContrast
                  onClick={() => onApply(noFilters)}
                >
                  Clear all filters
                </Button>
              </Flex>
            </Flex>
          </form>
        </Card>
      </Box>
    </Flex>
  );
}
