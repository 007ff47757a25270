import { zodResolver } from '@hookform/resolvers/zod';
import { Card, Flex, Grid } from '@radix-ui/themes';
import { roleLabels, type AuditQuery } from '@skyledger/contracts';
import { useForm } from 'react-hook-form';
import { ControlledSelect } from '@/components/ui/controlled-select';
import { FilterActions } from '@/components/ui/filter-actions';
import { TextInputField } from '@/components/ui/text-input-field';
import { useDeskPeople } from '@/features/people/api/get-desk-people';
import {
  auditFilterFormSchema,
  toAuditFilterForm,
  toAuditFilters,
  type AuditFilterForm,
  type AuditFilters as Filters,
} from '../forms/audit-filter-form';

interface AuditFiltersProps {
  query: AuditQuery;
  onApply: (filters: Filters) => void;
}

const noFilters: Filters = {};

/** The trail's filters; applying them writes the URL, so a view can be shared and exported. */
export function AuditFilters({ query, onApply }: AuditFiltersProps) {
  const { data: people } = useDeskPeople();
  const {
    register,
    control,
    handleSubmit,
    formState: { errors },
  } = useForm<AuditFilterForm>({
    resolver: zodResolver(auditFilterFormSchema),
    defaultValues: toAuditFilterForm(query),
  });
  const actorOptions = [
    { value: 'any', label: 'Anyone' },
    ...people.map((person) => ({
      value: person.id,
      label: `${person.displayName} (${roleLabels[person.role].toLowerCase()})`,
    })),
  ];
  const apply = handleSubmit((form) => onApply(toAuditFilters(auditFilterFormSchema.parse(form))));

  return (
    <Card size="2">
      <form aria-label="Filter the audit trail" noValidate onSubmit={apply}>
        <Flex direction="column" gap="4">
          <Grid columns={{ initial: '1', sm: '2', md: '3' }} gap="4">
            <TextInputField
              label="Action"
              hint="As stored, e.g. claim.cleared or verdict.edited"
              autoComplete="off"
              error={errors.action?.message}
              {...register('action')}
            />
            <TextInputField
              label="Entity type"
              hint="e.g. claim, verdict_version, rating_scale, user"
              autoComplete="off"
              error={errors.entityType?.message}
              {...register('entityType')}
            />
            <ControlledSelect control={control} name="actor" label="Who" options={actorOptions} />
            <TextInputField
              label="Claim id"
              hint="As in the claim's address"
              autoComplete="off"
              error={errors.claim?.message}
              {...register('claim')}
            />
            <TextInputField
              label="From"
              type="date"
              error={errors.from?.message}
              {...register('from')}
            />
            <TextInputField
              label="To"
              type="date"
              hint="The whole of this day counts"
              error={errors.to?.message}
              {...register('to')}
            />
          </Grid>
          <FilterActions onClear={() => onApply(noFilters)} />
        </Flex>
      </form>
    </Card>
  );
}
