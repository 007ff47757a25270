import { Card, Flex, Grid, Heading, Text } from '@radix-ui/themes';
import type { CalculatorInfo, WorksheetLineResult } from '@skyledger/calc';
import type { Role } from '@skyledger/contracts';
import { useId, useState } from 'react';
import { AppLink } from '@/components/ui/app-link';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { hasClaimRole } from '@/features/claims/claim-permissions';
import { initialFormState, type FieldState, type FormState } from '../form/form-state';
import { useLiveRun } from '../hooks/use-live-run';
import { CalculatorInputs } from './inputs/calculator-inputs';
import { ReferencesList } from './results/references-list';
import { ResultPanel } from './results/result-panel';
import { SaveWorkingPanel } from './save/save-working-panel';
import '../workbench.css';

interface WorkbenchCalculatorProps {
  calculator: CalculatorInfo;
  role: Role;
  claimId: string | null;
  onClaimChange: (claimId: string | null) => void;
}

/** Fills the unit of the values from a dataset column just chosen, unless one was typed. */
function withSeriesUnit(form: FormState, unit: string | undefined): FormState {
  const field = form.seriesUnit;
  if (!unit || field?.kind !== 'text' || field.value.trim() !== '') return form;
  return { ...form, seriesUnit: { kind: 'text', value: unit } };
}

/**
 * One calculator: its generated form, the live result beside it, and for science editors
 * and desk chiefs the way to save it to a claim.
 */
export function WorkbenchCalculator({
  calculator,
  role,
  claimId,
  onClaimChange,
}: WorkbenchCalculatorProps) {
  const inputsHeadingId = useId();
  const resultHeadingId = useId();
  const [form, setForm] = useState(() => initialFormState(calculator.inputs));
  // The API's refusal holds for the inputs it was sent; any edit clears it.
  const [serverErrors, setServerErrors] = useState<{
    form: FormState;
    errors: Record<string, string>;
  }>();
  const run = useLiveRun(calculator, form);
  const errors = {
    ...(run.state === 'refused' ? run.fieldErrors : {}),
    ...(serverErrors?.form === form ? serverErrors.errors : {}),
  };
  const lineResults =
    run.state === 'done' && run.result.calculatorId === 'worksheet'
      ? (run.result.outputs.results.value as readonly WorksheetLineResult[])
      : undefined;
  const wide = calculator.inputs.some((spec) => spec.kind !== 'number' && spec.kind !== 'choice');
  const change = (name: string, field: FieldState, unit?: string) =>
    setForm((current) => withSeriesUnit({ ...current, [name]: field }, unit));

  return (
    <Flex direction="column" gap="5">
      <PageHeader
        above={
          <AppLink
            to={paths.app.workbench.getHref(undefined, claimId ?? undefined)}
            size="2"
            highContrast
          >
            All calculators
          </AppLink>
        }
        title={calculator.title}
        purpose={calculator.summary}
      />
      <Grid columns={{ initial: '1', md: wide ? '1' : '2' }} gap="5" align="start">
        <Card asChild size="3">
          <section aria-labelledby={inputsHeadingId}>
            <Flex direction="column" gap="4">
              <Heading as="h2" size="5" id={inputsHeadingId}>
                Inputs
              </Heading>
              <form onSubmit={(event) => event.preventDefault()} noValidate>
                <CalculatorInputs
                  inputs={calculator.inputs}
                  form={form}
                  onChange={change}
                  errors={errors}
                  lineResults={lineResults}
                />
              </form>
            </Flex>
          </section>
        </Card>
        <section aria-labelledby={resultHeadingId}>
          <ResultPanel calculator={calculator} run={run} headingId={resultHeadingId} />
        </section>
      </Grid>
      {hasClaimRole(role, 'research') ? (
        <SaveWorkingPanel
          calculator={calculator}
          form={form}
          claimId={claimId}
          onClaimChange={onClaimChange}
          onInputErrors={(inputErrors) => setServerErrors({ form, errors: inputErrors })}
        />
      ) : (
        <Text as="p" size="2" color="gray">
          Science editors and desk chiefs save workings to claims; anyone on the desk can run them
          here.
        </Text>
      )}
      <ReferencesList keys={calculator.references} />
    </Flex>
  );
}
