import Box from '@mui/material/Box';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import InputAdornment from '@mui/material/InputAdornment';
import Stack from '@mui/material/Stack';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import type { FormulaScaledView, UnitSystem } from '@peakwise/shared';
import { Controller, useWatch, type Control } from 'react-hook-form';
import { FormTextField } from '@/components/form/form-text-field';
import { formatFactor, formatGrams, ouncesFor } from '../utils/format';
import type { FormulaFormValues, ScaleChoice } from '../utils/formula-form';
import { ChoiceToggle } from './choice-toggle';

const decimal = { inputMode: 'decimal' as const };
const end = (u: string) => ({ endAdornment: <InputAdornment position="end">{u}</InputAdornment> });

const CHOICES: { value: ScaleChoice; label: string }[] = [
  { value: 'none', label: 'As is' },
  { value: 'factor', label: 'Factor' },
  { value: 'dough-weight', label: 'Dough' },
  { value: 'pieces', label: 'Pieces' },
];

interface ScalingCardProps {
  control: Control<FormulaFormValues>;
  scaled: FormulaScaledView | null;
  system: UnitSystem;
}

/** Scale the batch by a factor, to a dough weight, or to pieces × piece weight; weighable grams. */
export function ScalingCard({ control, scaled, system }: ScalingCardProps) {
  const by = useWatch({ control, name: 'scaling.by' });
  return (
    <Card>
      <CardContent>
        <Stack spacing={2}>
          <Box>
            <Typography variant="h2">Batch size</Typography>
            <Typography variant="body2" color="text.secondary">
              Every baker’s percentage stays; only the weights change.
            </Typography>
          </Box>
          <Controller
            control={control}
            name="scaling.by"
            render={({ field }) => (
              <ChoiceToggle label="Scale by" value={field.value} options={CHOICES} onChange={field.onChange} />
            )}
          />
          {by === 'factor' && (
            <FormTextField
              control={control}
              name="scaling.factor"
              label="Multiply by"
              slotProps={{
                htmlInput: decimal,
                input: { startAdornment: <InputAdornment position="start">×</InputAdornment> },
              }}
            />
          )}
          {by === 'dough-weight' && (
            <FormTextField
              control={control}
              name="scaling.doughG"
              label="Total dough weight"
              slotProps={{ htmlInput: decimal, input: end('g') }}
            />
          )}
          {by === 'pieces' && (
            <Stack direction="row" spacing={1}>
              <FormTextField
                control={control}
                name="scaling.pieces"
                label="Pieces"
                slotProps={{ htmlInput: { inputMode: 'numeric' } }}
              />
              <FormTextField
                control={control}
                name="scaling.pieceG"
                label="Each"
                slotProps={{ htmlInput: decimal, input: end('g') }}
              />
              <FormTextField
                control={control}
                name="scaling.lossPercent"
                label="Loss"
                helperText="bowl, bench"
                slotProps={{ htmlInput: decimal, input: end('%') }}
              />
            </Stack>
          )}
          {by !== 'none' && scaled && (
            <Box data-testid="scaled">
              <Typography sx={{ fontWeight: 500 }}>
                {formatFactor(scaled.factor)} · {formatGrams(scaled.doughWeightG)} of dough ·{' '}
                {formatGrams(scaled.totalFlourG)} of flour
              </Typography>
              <Table size="small" aria-label="Scaled weights">
                <TableHead>
                  <TableRow>
                    <TableCell sx={{ pl: 0 }}>Weigh</TableCell>
                    <TableCell align="right" sx={{ pr: 0 }}>
                      On the scale
                    </TableCell>
                  </TableRow>
                </TableHead>
                <TableBody>
                  {scaled.lines.map((l, i) => (
                    <TableRow key={`${l.name}-${i}`}>
                      <TableCell sx={{ pl: 0 }}>{l.name}</TableCell>
                      <TableCell align="right" sx={{ pr: 0, fontVariantNumeric: 'tabular-nums', fontWeight: 500 }}>
                        {formatGrams(l.roundedG)}
                        {ouncesFor(l.roundedG, system) && (
                          <Typography variant="caption" color="text.secondary" sx={{ display: 'block' }}>
                            {ouncesFor(l.roundedG, system)}
                          </Typography>
                        )}
                      </TableCell>
                    </TableRow>
                  ))}
                  {scaled.blend.map((b) => (
                    <TableRow key={`blend-${b.name}`}>
                      <TableCell sx={{ pl: 2, color: 'text.secondary' }}>of which {b.name}</TableCell>
                      <TableCell
                        align="right"
                        sx={{ pr: 0, color: 'text.secondary', fontVariantNumeric: 'tabular-nums' }}
                      >
                        {formatGrams(b.roundedG)}
                      </TableCell>
                    </TableRow>
                  ))}
                </TableBody>
              </Table>
              <Typography variant="caption" color="text.secondary" sx={{ display: 'block', mt: 1 }}>
                Rounded to {scaled.roundingRule}.
              </Typography>
            </Box>
          )}
        </Stack>
      </CardContent>
    </Card>
  );
}
