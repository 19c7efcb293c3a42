import DeleteOutlined from '@mui/icons-material/DeleteOutlined';
import Box from '@mui/material/Box';
import IconButton from '@mui/material/IconButton';
import InputAdornment from '@mui/material/InputAdornment';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { FORMULA_INGREDIENT_KINDS, FORMULA_UNITS, type FormulaLineView, type UnitSystem } from '@peakwise/shared';
import { useWatch, type Control } from 'react-hook-form';
import { FormTextField } from '@/components/form/form-text-field';
import { formatGrams, formatPercent, ouncesFor } from '../utils/format';
import { foodsFor, needsFood, takesDensity, type FormulaFormValues } from '../utils/formula-form';

const KIND_LABEL: Record<(typeof FORMULA_INGREDIENT_KINDS)[number], string> = {
  flour: 'Flour',
  water: 'Water',
  starter: 'Starter',
  milk: 'Milk',
  butter: 'Butter',
  egg: 'Egg',
  sugar: 'Sugar',
  salt: 'Salt',
  yeast: 'Yeast',
  inclusion: 'Inclusion',
  other: 'Other',
};

// Water and milk by volume are weighed as tap water and whole milk until the baker says otherwise.
const UNCHOSEN: Partial<Record<(typeof FORMULA_INGREDIENT_KINDS)[number], string>> = {
  water: 'Tap water (default)',
  milk: 'Whole milk (default)',
};

const native = { select: { native: true } } as const;
const decimal = { inputMode: 'decimal' as const };
const end = (u: string) => ({ endAdornment: <InputAdornment position="end">{u}</InputAdornment> });

interface IngredientRowProps {
  control: Control<FormulaFormValues>;
  index: number;
  /** The computed line for this row; undefined while it is half typed or being computed. */
  line: FormulaLineView | undefined;
  view: 'total' | 'final';
  system: UnitSystem;
  onRemove: () => void;
}

/** One ingredient: what it is, how much in which unit, and (live) its grams and baker's %. */
export function IngredientRow({ control, index, line, view, system, onRemove }: IngredientRowProps) {
  const row = useWatch({ control, name: `ingredients.${index}` });
  const foods = foodsFor(row.kind);
  const showFood = needsFood(row) && (foods.length > 0 || row.food !== '');
  const percent = line ? (view === 'total' ? line.percentOfTotalFlour : line.percentOfFinalDoughFlour) : null;
  const n = index + 1;

  return (
    <Box
      data-testid="ingredient-row"
      sx={{ borderBottom: 1, borderColor: 'divider', pb: 1.5, '&:last-of-type': { borderBottom: 0 } }}
    >
      <Stack spacing={1.25}>
        <Stack direction="row" spacing={1} sx={{ alignItems: 'flex-start' }}>
          <FormTextField
            control={control}
            name={`ingredients.${index}.kind`}
            label="Kind"
            select
            slotProps={{ select: native.select, htmlInput: { 'aria-label': `Kind of line ${n}` } }}
            sx={{ width: 124, flexShrink: 0 }}
            size="small"
          >
            {FORMULA_INGREDIENT_KINDS.map((k) => (
              <option key={k} value={k}>
                {KIND_LABEL[k]}
              </option>
            ))}
          </FormTextField>
          <FormTextField
            control={control}
            name={`ingredients.${index}.name`}
            label="Name"
            size="small"
            slotProps={{ htmlInput: { 'aria-label': `Name of line ${n}` } }}
          />
          <IconButton aria-label={`Remove line ${n}`} onClick={onRemove} sx={{ mt: 0.25 }}>
            <DeleteOutlined />
          </IconButton>
        </Stack>
        <Stack direction="row" spacing={1} sx={{ alignItems: 'flex-start' }}>
          <FormTextField
            control={control}
            name={`ingredients.${index}.amount`}
            label="Amount"
            size="small"
            slotProps={{ htmlInput: { ...decimal, 'aria-label': `Amount of line ${n}` } }}
            sx={{ width: 96, flexShrink: 0 }}
          />
          <FormTextField
            control={control}
            name={`ingredients.${index}.unit`}
            label="Unit"
            select
            size="small"
            slotProps={{ select: native.select, htmlInput: { 'aria-label': `Unit of line ${n}` } }}
            sx={{ width: 92, flexShrink: 0 }}
          >
            {FORMULA_UNITS.map((u) => (
              <option key={u} value={u}>
                {u}
              </option>
            ))}
          </FormTextField>
          <Box sx={{ flexGrow: 1, textAlign: 'right', pt: 0.5 }} data-testid="line-result" aria-live="polite">
            <Typography sx={{ fontWeight: 500, fontVariantNumeric: 'tabular-nums' }}>
              {line ? formatGrams(line.grams) : '—'}
            </Typography>
            {line && ouncesFor(line.grams, system) && (
              <Typography variant="caption" color="text.secondary" sx={{ display: 'block' }}>
                {ouncesFor(line.grams, system)}
              </Typography>
            )}
            <Typography variant="body2" color="text.secondary" sx={{ fontVariantNumeric: 'tabular-nums' }}>
              {formatPercent(percent)}
            </Typography>
          </Box>
        </Stack>
        {(showFood || takesDensity(row) || row.kind === 'starter') && (
          <Stack direction="row" spacing={1} sx={{ alignItems: 'flex-start' }}>
            {showFood && (
              <FormTextField
                control={control}
                name={`ingredients.${index}.food`}
                label="What it is (for its weight)"
                select
                size="small"
                slotProps={{ select: native.select, inputLabel: { shrink: true } }}
              >
                <option value="">{UNCHOSEN[row.kind] ?? 'Not chosen'}</option>
                {foods.map((f) => (
                  <option key={f.id} value={f.id}>
                    {f.name}
                  </option>
                ))}
              </FormTextField>
            )}
            {takesDensity(row) && (
              <FormTextField
                control={control}
                name={`ingredients.${index}.densityGPerMl`}
                label="Your density"
                placeholder="optional"
                size="small"
                slotProps={{ htmlInput: decimal, input: end('g/mL'), inputLabel: { shrink: true } }}
                sx={{ width: 136, flexShrink: 0 }}
              />
            )}
            {row.kind === 'starter' && (
              <FormTextField
                control={control}
                name={`ingredients.${index}.starterHydrationPct`}
                label="Starter hydration"
                size="small"
                helperText="water ÷ flour × 100"
                slotProps={{ htmlInput: decimal, input: end('%') }}
                sx={{ width: 160 }}
              />
            )}
          </Stack>
        )}
        {line?.gramsNote && (
          <Typography variant="caption" color="text.secondary">
            {line.gramsNote}
          </Typography>
        )}
      </Stack>
    </Box>
  );
}
