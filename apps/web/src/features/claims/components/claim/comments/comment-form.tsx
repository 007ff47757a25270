import { zodResolver } from '@hookform/resolvers/zod';
import { Button, Flex } from '@radix-ui/themes';
import { createCommentSchema, type CreateCommentRequest } from '@skyledger/contracts';
import { useForm } from 'react-hook-form';
import { FormError } from '@/components/ui/form-error';
import type { ShowNotice } from '@/components/ui/toaster';
import { TextAreaField } from '@/components/ui/text-area-field';
import { applyApiError } from '@/lib/form-errors';
import { useAddComment } from '../../../api/add-comment';

export function CommentForm({ claimId, onNotice }: { claimId: string; onNotice: ShowNotice }) {
  const add = useAddComment(claimId);
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isSubmitting },
  } = useForm<CreateCommentRequest>({
    resolver: zodResolver(createCommentSchema),
    defaultValues: { body: '' },
  });
  const onSubmit = handleSubmit((values) =>
    add.mutateAsync(values).then(
      () => {
        reset({ body: '' });
        onNotice({ tone: 'success', text: 'Your comment is added.' });
      },
      (error: unknown) => applyApiError(error, setError, { fields: ['body'] }),
    ),
  );
  return (
    <form onSubmit={onSubmit} noValidate aria-label="Add a comment">
      <Flex direction="column" gap="3">
        <FormError message={errors.root?.server?.message} />
        <TextAreaField
          label="Your comment"
          rows={3}
          error={errors.body?.message}
          {...register('body')}
        />
        <Flex>
          <Button type="submit" highContrast loading={isSubmitting}>
            Add the comment
          </Button>
        </Flex>
      </Flex>
    </form>
  );
}
