import { zodResolver } from '@hookform/resolvers/zod';
import { Button, Card, Flex, Heading, Text } from '@radix-ui/themes';
import type { DatasetUploadView } from '@skyledger/contracts';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { useNavigate } from 'react-router-dom';
import { FormError } from '@/components/ui/form-error';
import { TextAreaField } from '@/components/ui/text-area-field';
import { TextInputField } from '@/components/ui/text-input-field';
import { useShowNotice } from '@/components/ui/toaster';
import { paths } from '@/config/paths';
import { applyApiError } from '@/lib/form-errors';
import { useCreateDataset } from '../../api/create-dataset';
import { importedMessage } from '../../imported-message';
import {
  columnChoicesFor,
  emptyImportDatasetForm,
  importDatasetFormFields,
  importDatasetFormSchema,
  toCreateDatasetRequest,
  type ImportDatasetForm,
} from '../../forms/import-dataset-form';
import { rowProblemsOf, type RowProblem } from '../../forms/row-problems';
import { ColumnChoices } from './column-choices';
import { CsvPreview } from './csv-preview';
import { RowProblemsCallout } from './row-problems-callout';
import { UploadCsvCard } from './upload-csv-card';

const sameColumns = (a: readonly string[], b: readonly string[]) =>
  a.length === b.length && a.every((column, index) => column === b[index]);

/**
 * Importing a dataset: upload the CSV, see its columns and first rows, choose the time
 * and value columns with their units, name and describe it, import. A refused import
 * lists the bad lines; a corrected file uploaded again keeps every choice made.
 */
export function ImportDataset() {
  const navigate = useNavigate();
  const showNotice = useShowNotice();
  const create = useCreateDataset();
  const [upload, setUpload] = useState<DatasetUploadView | null>(null);
  const [problems, setProblems] = useState<RowProblem[]>([]);
  const {
    control,
    register,
    handleSubmit,
    setError,
    getValues,
    reset,
    formState: { errors, isSubmitting },
  } = useForm<ImportDatasetForm>({
    resolver: zodResolver(importDatasetFormSchema),
    defaultValues: emptyImportDatasetForm,
  });

  const onUploaded = (next: DatasetUploadView) => {
    setProblems([]);
    create.reset();
    const current = getValues();
    const kept = sameColumns(
      current.columns.map((choice) => choice.column),
      next.columns,
    );
    reset(kept ? current : { ...current, ...columnChoicesFor(next) });
    setUpload(next);
  };

  const onSubmit = handleSubmit((values) => {
    if (!upload) return;
    setProblems([]);
    return create.mutateAsync(toCreateDatasetRequest(values, upload.attachment.id)).then(
      (dataset) => {
        showNotice({ tone: 'success', text: importedMessage(dataset) });
        navigate(paths.app.dataset.getHref(dataset.id));
      },
      (error: unknown) => {
        const found = rowProblemsOf(error);
        if (found.length > 0) return setProblems(found);
        applyApiError(error, setError, { fields: importDatasetFormFields });
      },
    );
  });

  return (
    <Flex direction="column" gap="5">
      <UploadCsvCard uploaded={upload} onUploaded={onUploaded} />
      {upload ? (
        <Card size="3">
          <Flex direction="column" gap="3">
            <Heading as="h2" size="4">
              2. Check the columns and first rows
            </Heading>
            <CsvPreview upload={upload} />
          </Flex>
        </Card>
      ) : null}
      {upload ? (
        <Card size="3">
          <form onSubmit={onSubmit} noValidate aria-label="Import the dataset">
            <Flex direction="column" gap="5">
              <Flex direction="column" gap="3">
                <Heading as="h2" size="4">
                  3. Choose the columns
                </Heading>
                <ColumnChoices control={control} register={register} errors={errors} />
              </Flex>
              <Flex direction="column" gap="3">
                <Heading as="h2" size="4">
                  4. Name and describe it
                </Heading>
                <TextInputField
                  label="Name"
                  autoComplete="off"
                  hint="What the desk will call it in lists and workings, e.g. “Station annual anomalies, 1979–2025”."
                  error={errors.name?.message}
                  {...register('name')}
                />
                <TextAreaField
                  label="Description"
                  rows={4}
                  hint="Say where the data came from: who published it, which version or file, and when it was downloaded. Say so if it is invented or synthetic."
                  error={errors.description?.message}
                  {...register('description')}
                />
              </Flex>
              {problems.length > 0 ? <RowProblemsCallout problems={problems} /> : null}
              <FormError message={errors.root?.server?.message} />
              <Flex gap="3" align="center" wrap="wrap">
                <Button type="submit" highContrast size="3" loading={isSubmitting}>
                  Import the dataset
                </Button>
                <Text size="2" color="gray">
                  Every row is checked; if one is bad, nothing is imported.
                </Text>
              </Flex>
            </Flex>
          </form>
        </Card>
      ) : null}
    </Flex>
  );
}
