import Alert from '@mui/material/Alert';
import Stack from '@mui/material/Stack';
import type { FormulaCaution } from '@peakwise/shared';

// Shown before anything is computed too: a formula is raw dough whatever is in it.
const RAW_DOUGH: FormulaCaution = {
  code: 'raw-dough',
  message:
    'Raw flour and raw dough are not ready-to-eat: do not taste the dough, and wash hands and surfaces after handling it.',
};

/** The food-safety cautions the computed view carries (raw dough; dairy or egg at room temperature). */
export function FormulaCautions({ cautions }: { cautions: FormulaCaution[] | undefined }) {
  const shown = cautions && cautions.length > 0 ? cautions : [RAW_DOUGH];
  return (
    <Stack spacing={1} data-testid="formula-cautions">
      {shown.map((c) => (
        <Alert key={c.code} severity={c.code === 'raw-dough' ? 'info' : 'warning'}>
          {c.message}
        </Alert>
      ))}
    </Stack>
  );
}
