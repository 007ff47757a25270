import { Card, Flex, Grid, Text } from '@radix-ui/themes';
import { useId } from 'react';
import { useWatch, type Control, type FieldErrors, type UseFormRegister } from 'react-hook-form';
import { ControlledCheckbox } from '@/components/ui/controlled-checkbox';
import { ControlledSelect } from '@/components/ui/controlled-select';
import { TextInputField } from '@/components/ui/text-input-field';
import type { ImportDatasetForm } from '../../forms/import-dataset-form';

/** Units the desk's calculators read, offered while typing; any other may be typed. */
const commonUnits = ['K', 'degC', 'ppm', 'ppb', 'W/m^2', 'ZJ', 'mm', '%', 'GtC', 'GtCO2'];

interface ColumnChoicesProps {
  control: Control<ImportDatasetForm>;
  register: UseFormRegister<ImportDatasetForm>;
  errors: FieldErrors<ImportDatasetForm>;
}

/** The time column, then each other column: imported or not, with its unit and label. */
export function ColumnChoices({ control, register, errors }: ColumnChoicesProps) {
  const unitListId = useId();
  const [timeColumn, columns] = useWatch({ control, name: ['timeColumn', 'columns'] });
  return (
    <Flex direction="column" gap="4">
      <ControlledSelect
        control={control}
        name="timeColumn"
        label="Time column"
        placeholder="Choose a column"
        options={columns.map(({ column }) => ({ value: column, label: column }))}
        hint="Years (1998, 1998.5) or dates (1998-07, 1998-07-15); each time once."
      />
      <datalist id={unitListId}>
        {commonUnits.map((unit) => (
          <option key={unit} value={unit} />
        ))}
      </datalist>
      <Flex direction="column" gap="2">
        <Text as="p" size="2" weight="bold" id={`${unitListId}-values`}>
          Columns of values
        </Text>
        {errors.columns?.message ? (
          <Text size="2" color="red" className="sl-field-error" role="alert">
            {errors.columns.message}
          </Text>
        ) : null}
        <Grid
          columns={{ initial: '1', md: '2' }}
          gap="3"
          aria-labelledby={`${unitListId}-values`}
          role="group"
        >
          {columns.map((choice, index) =>
            choice.column === timeColumn ? null : (
              <Card key={choice.column} size="2" asChild>
                <fieldset className="sl-fieldset">
                  <legend className="sl-fieldset-legend">Column “{choice.column}”</legend>
                  <Flex direction="column" gap="3">
                    <ControlledCheckbox
                      control={control}
                      name={`columns.${index}.use`}
                      label={`Import “${choice.column}”`}
                    />
                    <Grid columns={{ initial: '1', sm: '2' }} gap="3">
                      <TextInputField
                        label={`Unit of “${choice.column}”`}
                        list={unitListId}
                        autoComplete="off"
                        disabled={!choice.use}
                        hint="e.g. K, degC, ppm, W/m^2"
                        error={errors.columns?.[index]?.unit?.message}
                        {...register(`columns.${index}.unit`)}
                      />
                      <TextInputField
                        label={`Label of “${choice.column}” (optional)`}
                        autoComplete="off"
                        disabled={!choice.use}
                        placeholder={choice.column}
                        hint="What charts and workings call it"
                        error={errors.columns?.[index]?.label?.message}
                        {...register(`columns.${index}.label`)}
                      />
                    </Grid>
                  </Flex>
                </fieldset>
              </Card>
            ),
          )}
        </Grid>
      </Flex>
    </Flex>
  );
}
