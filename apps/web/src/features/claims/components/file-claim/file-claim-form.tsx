import { zodResolver } from '@hookform/resolvers/zod';
import { Box, Button, Card, Flex, Heading, Text } from '@radix-ui/themes';
import { useState } from 'react';
import { Controller, FormProvider, useForm, useWatch } from 'react-hook-form';
import { useNavigate } from 'react-router-dom';
import { FileField } from '@/components/ui/file-field';
import { FormError } from '@/components/ui/form-error';
import { ProgressLine } from '@/components/ui/progress-line';
import { useShowNotice } from '@/components/ui/toaster';
import { paths } from '@/config/paths';
import { changeErrorMessage } from '@/lib/api-error-messages';
import { formatBytes } from '@/lib/format-bytes';
import { useDeskTimeZone } from '@/lib/desk-time-zone';
import { applyApiError } from '@/lib/form-errors';
import { useFileClaim, type FilingStage } from '../../api/file-claim-with-capture';
import { evidenceFileAccept, evidenceFileHint } from '../../forms/evidence-file';
import {
  emptyFileClaimForm,
  fileClaimFormField,
  fileClaimFormFields,
  fileClaimFormSchema,
  toCreateClaimRequest,
  type FileClaimForm as FormValues,
  type FileClaimValues,
} from '../../forms/file-claim-form';
import { AppearanceFields } from '../shared/appearance-fields';
import { ClaimWordsFields } from '../shared/claim-words-fields';
import { ClaimantChooser } from './claimant-chooser';
import { SimilarClaimsForText } from './similar-claims-for-text';

const stageWords: Record<FilingStage, string> = {
  filing: 'Filing the claim…',
  uploading: 'Uploading the capture…',
  attaching: 'Attaching the capture to the appearance…',
};

/** "File a claim": the claim as said, who said it, where it was first seen, and its capture. */
export function FileClaimForm() {
  const navigate = useNavigate();
  const filing = useFileClaim();
  const [stage, setStage] = useState<FilingStage | null>(null);
  const [sent, setSent] = useState<number>();
  const deskTimeZone = useDeskTimeZone();
  const showNotice = useShowNotice();
  const form = useForm<FormValues, unknown, FileClaimValues>({
    resolver: zodResolver(fileClaimFormSchema),
    defaultValues: emptyFileClaimForm(deskTimeZone),
  });
  const {
    control,
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = form;
  const capture = useWatch({ control, name: 'capture' });

  const onSubmit = handleSubmit((values) =>
    filing
      .mutateAsync({
        body: toCreateClaimRequest(values),
        capture: values.capture,
        onStage: setStage,
        onProgress: setSent,
      })
      .then(
        ({ claim, captureError }) => {
          showNotice(
            captureError
              ? {
                  tone: 'problem',
                  text: `The claim is filed, but its capture was not attached: ${changeErrorMessage(captureError, 'The appearance changed meanwhile.')} Add the capture again under Appearances.`,
                }
              : { tone: 'success', text: 'The claim is filed.' },
          );
          navigate(paths.app.claim.getHref(claim.id, captureError ? 'appearances' : undefined));
        },
        (error: unknown) => {
          setStage(null);
          applyApiError(error, setError, {
            fields: fileClaimFormFields,
            formField: fileClaimFormField,
          });
        },
      ),
  );

  return (
    <FormProvider {...form}>
      <form onSubmit={onSubmit} noValidate aria-label="File a claim">
        <Flex direction="column" gap="5">
          <FormError message={errors.root?.server?.message} />
          <Card size="3">
            <Flex direction="column" gap="4">
              <Heading as="h2" size="4">
                The claim
              </Heading>
              <ClaimWordsFields
                control={control}
                register={register}
                afterText={<SimilarClaimsForText control={control} />}
              />
            </Flex>
          </Card>
          <Card size="3">
            <Flex direction="column" gap="4">
              <Heading as="h2" size="4">
                Who made it
              </Heading>
              <ClaimantChooser />
            </Flex>
          </Card>
          <Card size="3">
            <Flex direction="column" gap="4">
              <Flex direction="column" gap="1">
                <Heading as="h2" size="4">
                  Where it was first seen (optional)
                </Heading>
                <Text size="2" color="gray">
                  More appearances can be added on the claim&apos;s page.
                </Text>
              </Flex>
              <AppearanceFields control={control} register={register} />
              <Controller
                control={control}
                name="capture"
                render={({ field }) => (
                  <FileField
                    label="Capture of the page (optional)"
                    accept={evidenceFileAccept}
                    hint={
                      capture
                        ? `${capture.name}, ${formatBytes(capture.size)}: uploaded once the claim is filed`
                        : `A screenshot or saved copy: ${evidenceFileHint}`
                    }
                    name={field.name}
                    inputRef={field.ref}
                    onFileChange={field.onChange}
                    error={errors.capture?.message}
                  />
                )}
              />
            </Flex>
          </Card>
          <Flex gap="3" align="center" wrap="wrap">
            <Button type="submit" size="3" highContrast loading={isSubmitting}>
              File the claim
            </Button>
            <Box role="status" flexGrow="1">
              {isSubmitting && stage ? (
                <ProgressLine
                  label={stageWords[stage]}
                  fraction={stage === 'uploading' ? sent : undefined}
                />
              ) : null}
            </Box>
          </Flex>
        </Flex>
      </form>
    </FormProvider>
  );
}
