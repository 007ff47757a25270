import { Grid } from '@radix-ui/themes';
import {
  Controller,
  type Control,
  type FieldValues,
  type Path,
  type UseFormRegister,
} from 'react-hook-form';
import { TextInputField } from '@/components/ui/text-input-field';
import { ZonedDateTimeField } from '@/components/ui/zoned-date-time-field';
import { useFieldErrors } from '@/lib/use-field-errors';
import type { AppearanceFormValues } from '../../forms/appearance-form';

interface AppearanceFieldsProps<T extends FieldValues> {
  control: Control<T>;
  register: UseFormRegister<T>;
}

/** Where and when a claim was seen, on any form that keeps them under `appearance`. */
export function AppearanceFields<T extends FieldValues & { appearance: AppearanceFormValues }>({
  control,
  register,
}: AppearanceFieldsProps<T>) {
  const errorOf = useFieldErrors(control);
  const name = (field: keyof AppearanceFormValues) => `appearance.${field}` as Path<T>;
  return (
    <>
      <Grid columns={{ initial: '1', sm: '2' }} gap="4">
        <TextInputField
          label="Web address"
          type="url"
          inputMode="url"
          placeholder="https://"
          autoComplete="off"
          error={errorOf(name('url'))}
          {...register(name('url'))}
        />
        <TextInputField
          label="Outlet or platform"
          hint="e.g. a council webcast, a newspaper, a social network"
          autoComplete="off"
          error={errorOf(name('outlet'))}
          {...register(name('outlet'))}
        />
      </Grid>
      <Controller
        control={control}
        name={name('seenTimeZone')}
        render={({ field }) => (
          <ZonedDateTimeField
            label="Seen at"
            localInput={register(name('seenAtLocal'))}
            zone={field.value as string}
            onZoneChange={field.onChange}
            zoneRef={field.ref}
            hint="The time on the clock where it was seen, and that clock's time zone"
            localError={errorOf(name('seenAtLocal'))}
            zoneError={errorOf(name('seenTimeZone'))}
          />
        )}
      />
    </>
  );
}
