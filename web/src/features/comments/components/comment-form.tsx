import { COMMENT_MAX_LENGTH, type CreateCommentRequest } from '@peakwise/shared';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import { useForm, useWatch } from 'react-hook-form';
import { FormAlert } from '@/components/form/form-alert';
import { FormTextField } from '@/components/form/form-text-field';
import { applyServerErrors } from '@/lib/form-errors';
import { useIdempotencyKey } from '@/lib/idempotency';
import { useCreateComment } from '../api/create-comment';
import type { CommentSubject } from '../api/query-keys';

const FIELDS = ['body'] as const;

/** The reply box under a thread; the server's refusal lands on the field. */
export function CommentForm({ subject, label }: { subject: CommentSubject; label: string }) {
  const create = useCreateComment(subject);
  const key = useIdempotencyKey();
  const { control, handleSubmit, setError, formState, reset } = useForm<CreateCommentRequest>({
    defaultValues: { body: '' },
  });
  const length = useWatch({ control, name: 'body' }).length;

  const onSubmit = handleSubmit(async (values) => {
    try {
      await create.mutateAsync({ body: { body: values.body.trim() }, headers: key.headers() });
      key.settle();
      reset({ body: '' });
    } catch (error) {
      key.settle(error);
      applyServerErrors(error, setError, FIELDS);
    }
  });

  return (
    <Stack component="form" noValidate onSubmit={(e) => void onSubmit(e)} spacing={1.5}>
      <FormTextField
        control={control}
        name="body"
        label={label}
        multiline
        minRows={2}
        maxRows={8}
        fullWidth
        rules={{
          validate: (v) => v.trim().length > 0 || 'Write something first.',
          maxLength: { value: COMMENT_MAX_LENGTH, message: `Keep it under ${COMMENT_MAX_LENGTH} characters.` },
        }}
        helperText={length > COMMENT_MAX_LENGTH * 0.8 ? `${length} of ${COMMENT_MAX_LENGTH} characters` : undefined}
      />
      <FormAlert message={formState.errors.root?.server?.message} />
      <Button type="submit" variant="contained" loading={formState.isSubmitting} sx={{ alignSelf: 'flex-start' }}>
        Post comment
      </Button>
    </Stack>
  );
}
