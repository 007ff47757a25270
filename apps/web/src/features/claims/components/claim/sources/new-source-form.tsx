import { zodResolver } from '@hookform/resolvers/zod';
import { Button, Dialog, Flex, Grid } from '@radix-ui/themes';
import { sourceKindLabels, sourceKinds } from '@skyledger/contracts';
import { useForm } from 'react-hook-form';
import { FormError } from '@/components/ui/form-error';
import { ControlledSelect } from '@/components/ui/controlled-select';
import { TextInputField } from '@/components/ui/text-input-field';
import { applyApiError } from '@/lib/form-errors';
import type { useLinkSource } from '../../../api/link-source';
import {
  emptySourceForm,
  sourceFormFields,
  sourceFormSchema,
  toCreateSourceRequest,
  type SourceForm,
} from '../../../forms/source-form';
import { GradeFields } from './grade-fields';

const kindOptions = sourceKinds.map((kind) => ({ value: kind, label: sourceKindLabels[kind] }));

interface NewSourceFormProps {
  link: ReturnType<typeof useLinkSource>;
  onCited: (title: string) => void;
}

/** A new source with its citation, kind and grade, cited for the claim in one step. */
export function NewSourceForm({ link, onCited }: NewSourceFormProps) {
  const {
    control,
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<SourceForm>({
    resolver: zodResolver(sourceFormSchema),
    defaultValues: emptySourceForm,
  });

  const onSubmit = handleSubmit((values) =>
    link.mutateAsync({ source: toCreateSourceRequest(values) }).then(
      (source) => onCited(source.title),
      (error: unknown) =>
        applyApiError(error, setError, {
          fields: sourceFormFields,
          formField: (field) => field.replace(/^source\./, ''),
        }),
    ),
  );

  return (
    <form onSubmit={onSubmit} noValidate aria-label="A new source">
      <Flex direction="column" gap="4">
        <FormError message={errors.root?.server?.message} />
        <TextInputField
          label="Title"
          autoComplete="off"
          error={errors.title?.message}
          {...register('title')}
        />
        <Grid columns={{ initial: '1', sm: '2' }} gap="4">
          <TextInputField
            label="Authors (optional)"
            autoComplete="off"
            error={errors.authors?.message}
            {...register('authors')}
          />
          <TextInputField
            label="Publisher (optional)"
            autoComplete="off"
            error={errors.publisher?.message}
            {...register('publisher')}
          />
          <TextInputField
            label="Year (optional)"
            inputMode="numeric"
            autoComplete="off"
            error={errors.year?.message}
            {...register('year')}
          />
          <ControlledSelect
            control={control}
            name="kind"
            label="Kind of source"
            options={kindOptions}
            placeholder="Choose a kind"
          />
          <TextInputField
            label="DOI"
            hint="e.g. 10.1029/98GL01908"
            autoComplete="off"
            error={errors.doi?.message}
            {...register('doi')}
          />
          <TextInputField
            label="Web address"
            type="url"
            placeholder="https://"
            autoComplete="off"
            hint="A DOI or a web address, except for an interview"
            error={errors.url?.message}
            {...register('url')}
          />
          <TextInputField
            label="Accessed on (optional)"
            type="date"
            error={errors.accessedOn?.message}
            {...register('accessedOn')}
          />
        </Grid>
        <GradeFields control={control} register={register} />
        <Flex gap="3" justify="end" wrap="wrap">
          <Dialog.Close>
            <Button type="button" variant="soft" color="gray" highContrast>
              Cancel
            </Button>
          </Dialog.Close>
          <Button type="submit" highContrast loading={isSubmitting}>
            Cite the new source
          </Button>
        </Flex>
      </Flex>
    </form>
  );
}
