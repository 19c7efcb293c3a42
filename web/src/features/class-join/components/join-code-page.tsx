import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Stack from '@mui/material/Stack';
import { useEffect, useState } from 'react';
import { useForm } from 'react-hook-form';
import { FormAlert } from '@/components/form/form-alert';
import { FormTextField } from '@/components/form/form-text-field';
import { Page } from '@/components/layout/page';
import { isApiError } from '@/lib/api-client';
import { applyServerErrors } from '@/lib/form-errors';
import { useIdempotencyKey } from '@/lib/idempotency';
import { useCodePreview } from '../api/get-code-preview';
import { useJoinByCode } from '../api/join-by-code';
import { joinCodeProblem, normalizeJoinCode } from '../utils/join-code';
import { JoinedNotice } from './joined-notice';
import { JoinPreview } from './join-preview';

const FIELDS = ['code'] as const;
const UNKNOWN_CODE = 'No class has this code. Check it with your instructor: they may have made a new one.';

/** Join a class with the code an instructor wrote on the board: look it up, read what it shares, join. */
export function JoinCodePage({ initialCode }: { initialCode: string }) {
  const [code, setCode] = useState<string | null>(null);
  const preview = useCodePreview(code);
  const join = useJoinByCode();
  const key = useIdempotencyKey();
  const { control, handleSubmit, setError, formState } = useForm<{ code: string }>({
    defaultValues: { code: initialCode },
  });

  // A lookup that finds nothing belongs on the field, where the baker retypes.
  const notFound = isApiError(preview.error) && preview.error.status === 404;
  const failedAt = preview.errorUpdatedAt;
  useEffect(() => {
    if (notFound) setError('code', { type: 'server', message: UNKNOWN_CODE }, { shouldFocus: true });
  }, [notFound, failedAt, setError]);

  const onLookUp = handleSubmit((values) => {
    join.reset();
    const next = normalizeJoinCode(values.code);
    // The same code again asks again (the instructor may have just turned joining on).
    if (next === code) void preview.refetch();
    else setCode(next);
  });

  const onJoin = async () => {
    if (!code) return;
    try {
      await join.mutateAsync({ body: { code }, headers: key.headers() });
      key.settle();
    } catch (error) {
      key.settle(error);
      applyServerErrors(error, setError, FIELDS);
    }
  };

  const p = preview.data;
  return (
    <Page title="Join a class" intro="Your instructor has a join code for the class: 8 letters and digits.">
      <Card>
        <CardContent>
          <Stack component="form" noValidate onSubmit={(e) => void onLookUp(e)} spacing={2}>
            <FormTextField
              control={control}
              name="code"
              label="Join code"
              autoComplete="off"
              slotProps={{
                htmlInput: {
                  autoCapitalize: 'characters',
                  spellCheck: false,
                  style: { letterSpacing: '0.15em', textTransform: 'uppercase' },
                },
              }}
              helperText="Capitals or not, spaces and dashes are fine."
              rules={{ validate: (v) => joinCodeProblem(v) ?? true }}
            />
            {preview.isError && !notFound && <FormAlert message={preview.error.message} />}
            <Button
              type="submit"
              variant={p ? 'outlined' : 'contained'}
              size="large"
              loading={preview.isFetching}
              sx={{ alignSelf: { sm: 'flex-start' } }}
            >
              Find class
            </Button>
          </Stack>
        </CardContent>
      </Card>
      {p && code && (
        <JoinPreview
          preview={p}
          actions={
            join.isSuccess || p.alreadyMember ? (
              <JoinedNotice name={p.name} instructorName={p.instructorName} already={!join.isSuccess} />
            ) : (
              <Stack spacing={1.5}>
                <FormAlert message={formState.errors.root?.server?.message} />
                <Button
                  variant="contained"
                  size="large"
                  loading={join.isPending}
                  onClick={() => void onJoin()}
                  sx={{ alignSelf: { sm: 'flex-start' } }}
                >
                  Join class
                </Button>
              </Stack>
            )
          }
        />
      )}
    </Page>
  );
}
