import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm, type DefaultValues, type FieldValues } from 'react-hook-form';
import type { z } from 'zod';
import { applyApiError, type ApplyApiErrorOptions } from '@/lib/form-errors';

interface FormDialogOptions<TForm extends FieldValues, TValues, TResult> {
  schema: z.ZodType<TValues, TForm>;
  /** What the form holds when it opens, and again after it closes. */
  initial: () => TForm;
  send: (values: TValues) => Promise<TResult>;
  /** After a success, once the dialog has closed (e.g. a notice). */
  onSent: (result: TResult) => void;
  /** Where the API's field errors show on this form. */
  apiErrors: ApplyApiErrorOptions<TForm>;
}

/**
 * A react-hook-form form in a FormDialog: it closes and starts afresh after a success, puts
 * the API's errors on their fields otherwise, and forgets what was typed when cancelled.
 */
export function useFormDialog<TForm extends FieldValues, TValues, TResult>({
  schema,
  initial,
  send,
  onSent,
  apiErrors,
}: FormDialogOptions<TForm, TValues, TResult>) {
  const [open, setOpen] = useState(false);
  const form = useForm<TForm, unknown, TValues>({
    resolver: zodResolver(schema),
    defaultValues: initial() as DefaultValues<TForm>,
  });
  const onSubmit = form.handleSubmit((values) =>
    send(values).then(
      (result) => {
        setOpen(false);
        form.reset(initial());
        onSent(result);
      },
      (error: unknown) => applyApiError(error, form.setError, apiErrors),
    ),
  );
  const dialog = {
    open,
    onOpenChange: (next: boolean) => {
      setOpen(next);
      if (!next) form.reset(initial());
    },
    onSubmit,
    submitting: form.formState.isSubmitting,
    formError: form.formState.errors.root?.server?.message,
  };
  return { form, dialog };
}
