import Add from '@mui/icons-material/Add';
import DeleteOutlined from '@mui/icons-material/DeleteOutlined';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import IconButton from '@mui/material/IconButton';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import type { FormulaBlendLineView } from '@peakwise/shared';
import { useFieldArray, useWatch, type Control } from 'react-hook-form';
import { FormTextField } from '@/components/form/form-text-field';
import { parseNumber } from '@/lib/format/units';
import { formatGrams, formatPercent } from '../utils/format';
import type { FormulaFormValues } from '../utils/formula-form';

interface BlendCardProps {
  control: Control<FormulaFormValues>;
  /** The computed blend, one entry per complete row, in order. */
  blend: FormulaBlendLineView[];
  finalDoughFlourG: number | null;
}

/** The flour lines split into flours by parts (3 : 1 : 2), shown as % and grams. */
export function BlendCard({ control, blend, finalDoughFlourG }: BlendCardProps) {
  const { fields, append, remove } = useFieldArray({ control, name: 'blend' });
  const rows = useWatch({ control, name: 'blend' });
  // The computed blend skips half-typed rows; count complete rows to find each row's answer.
  let k = 0;
  const results = rows.map((r) => (r.name.trim() !== '' && (parseNumber(r.parts) ?? 0) > 0 ? blend[k++] : undefined));

  return (
    <Card>
      <CardContent>
        <Stack spacing={1.5}>
          <Box>
            <Typography variant="h2">Flour blend</Typography>
            <Typography variant="body2" color="text.secondary">
              Split the flour you weigh in
              {finalDoughFlourG !== null ? ` (${formatGrams(finalDoughFlourG)})` : ''} by parts, e.g.{' '}
              <Box component="span" sx={{ whiteSpace: 'nowrap' }}>
                3 : 1 : 2
              </Box>
              .
            </Typography>
          </Box>
          {fields.map((field, i) => (
            <Stack direction="row" spacing={1} key={field.id} sx={{ alignItems: 'flex-start' }} data-testid="blend-row">
              <FormTextField
                control={control}
                name={`blend.${i}.name`}
                label="Flour"
                size="small"
                slotProps={{ htmlInput: { 'aria-label': `Blend flour ${i + 1}` } }}
              />
              <FormTextField
                control={control}
                name={`blend.${i}.parts`}
                label="Parts"
                size="small"
                slotProps={{ htmlInput: { inputMode: 'decimal', 'aria-label': `Parts of blend flour ${i + 1}` } }}
                sx={{ width: 72, flexShrink: 0 }}
              />
              <Box sx={{ width: 72, flexShrink: 0, textAlign: 'right', pt: 0.25 }} data-testid="blend-result">
                <Typography variant="body2" sx={{ fontWeight: 500 }}>
                  {results[i] ? formatGrams(results[i].grams) : '—'}
                </Typography>
                <Typography variant="caption" color="text.secondary">
                  {results[i] ? formatPercent(results[i].percent) : ''}
                </Typography>
              </Box>
              <IconButton aria-label={`Remove blend flour ${i + 1}`} onClick={() => remove(i)}>
                <DeleteOutlined />
              </IconButton>
            </Stack>
          ))}
          <Button startIcon={<Add />} onClick={() => append({ name: '', parts: '1' })} sx={{ alignSelf: 'flex-start' }}>
            Add a flour to the blend
          </Button>
        </Stack>
      </CardContent>
    </Card>
  );
}
