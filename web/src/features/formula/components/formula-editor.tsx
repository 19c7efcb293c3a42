import Add from '@mui/icons-material/Add';
import PrintOutlined from '@mui/icons-material/PrintOutlined';
import ThermostatOutlined from '@mui/icons-material/ThermostatOutlined';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import type { Formula } from '@peakwise/shared';
import { useState } from 'react';
import { useFieldArray, useForm, useWatch, type Path } from 'react-hook-form';
import { Link as RouterLink } from 'react-router-dom';
import { FormAlert } from '@/components/form/form-alert';
import { FormTextField } from '@/components/form/form-text-field';
import { applyServerErrors } from '@/lib/form-errors';
import { useSignedInAccount } from '@/lib/auth/use-signed-in-account';
import { useIdempotencyKey } from '@/lib/idempotency';
import { useComputedFormula } from '../api/compute-formula';
import { useCreateFormula } from '../api/create-formula';
import { useUpdateFormula } from '../api/update-formula';
import { formFields, liveProblems } from '../utils/editor-errors';
import { emptyRow, toCreateRequest, toLiveRequest, type FormulaFormValues } from '../utils/formula-form';
import { useDebounced } from '../utils/use-debounced';
import { BlendCard } from './blend-card';
import { DeleteFormulaButton } from './delete-formula-button';
import { FormulaCautions } from './formula-cautions';
import { FormulaFigures, type FormulaViewMode } from './formula-figures';
import { IngredientRow } from './ingredient-row';
import { ScalingCard } from './scaling-card';

interface FormulaEditorProps {
  /** The saved formula being edited, or undefined for a new one. */
  formula: Formula | undefined;
  defaultValues: FormulaFormValues;
  onSaved: (formula: Formula) => void;
}

/** The formula editor: lines in any unit, live grams and baker's percentages, blend, batch size. */
export function FormulaEditor({ formula, defaultValues, onSaved }: FormulaEditorProps) {
  const { control, handleSubmit, setError, formState } = useForm<FormulaFormValues>({ defaultValues });
  const { fields, append, remove } = useFieldArray({ control, name: 'ingredients' });
  const [view, setView] = useState<FormulaViewMode>('total');
  const create = useCreateFormula();
  const update = useUpdateFormula(formula?.id ?? '');
  const idempotency = useIdempotencyKey();
  const { unitSystem } = useSignedInAccount();

  const values = useWatch({ control }) as FormulaFormValues;
  const live = useDebounced(toLiveRequest(values), 250);
  const computed = useComputedFormula(live?.request ?? null);
  const current = live ? computed.data : undefined;
  // While a new answer is on its way the previous one stays up; its lines only match if the rows do.
  const linesMatch = current !== undefined && current.lines.length === live?.rows.length;
  const lineOf = new Map((linesMatch ? live.rows : []).map((row, k) => [row, current?.lines[k]]));
  const problems = liveProblems(
    computed.error,
    live?.rows ?? [],
    values.ingredients.map((r) => r.name),
  );
  const waterG = current?.lines.reduce((s, l) => s + (l.kind === 'water' ? l.grams : 0), 0) ?? 0;

  const onSubmit = handleSubmit(async (form) => {
    const body = toCreateRequest(form);
    try {
      if (formula) {
        onSaved(await update.mutateAsync(body));
      } else {
        const saved = await create.mutateAsync({ body, headers: idempotency.headers() });
        idempotency.settle();
        onSaved(saved);
      }
    } catch (error) {
      if (!formula) idempotency.settle(error);
      const fields = formFields(form.ingredients.length, form.blend.length) as Path<FormulaFormValues>[];
      applyServerErrors(error, setError, fields);
    }
  });

  return (
    <Stack component="form" noValidate onSubmit={(e) => void onSubmit(e)} spacing={2}>
      <FormTextField control={control} name="name" label="Formula name" />
      <Box
        sx={{
          display: 'grid',
          gap: 2,
          gridTemplateColumns: { xs: 'minmax(0, 1fr)', md: 'minmax(0, 1fr) minmax(0, 1fr)' },
          alignItems: 'start',
        }}
      >
        <Stack spacing={2}>
          <Card>
            <CardContent>
              <Stack spacing={1.5}>
                <Box>
                  <Typography variant="h2">Ingredients</Typography>
                  <Typography variant="body2" color="text.secondary">
                    Type amounts as your recipe has them — grams, cups, spoons — and see the weight.
                  </Typography>
                </Box>
                {fields.map((field, i) => (
                  <IngredientRow
                    key={field.id}
                    control={control}
                    index={i}
                    line={lineOf.get(i)}
                    view={view}
                    system={unitSystem}
                    onRemove={() => remove(i)}
                  />
                ))}
                <Button startIcon={<Add />} onClick={() => append(emptyRow('other'))} sx={{ alignSelf: 'flex-start' }}>
                  Add an ingredient
                </Button>
              </Stack>
            </CardContent>
          </Card>
          {problems.length > 0 && (
            <Alert severity="warning" data-testid="live-problems">
              {problems.map((p) => (
                <div key={p}>{p}</div>
              ))}
            </Alert>
          )}
        </Stack>
        <Stack spacing={2} sx={{ position: { md: 'sticky' }, top: { md: 80 } }}>
          {current ? (
            <FormulaFigures computed={current} view={view} onViewChange={setView} />
          ) : (
            <Alert severity="info">
              {problems.length > 0
                ? 'The figures come back once the line named above can be weighed.'
                : 'Add a flour line with its amount to see the baker’s percentages.'}
            </Alert>
          )}
          <FormulaCautions cautions={current?.cautions} />
        </Stack>
      </Box>
      <BlendCard control={control} blend={current?.blend ?? []} finalDoughFlourG={current?.finalDoughFlourG ?? null} />
      <ScalingCard control={control} scaled={current?.scaled ?? null} system={unitSystem} />
      <FormTextField control={control} name="notes" label="Notes" multiline minRows={2} />
      <FormAlert message={formState.errors.root?.server?.message} />
      <Button type="submit" variant="contained" size="large" loading={formState.isSubmitting} sx={{ minHeight: 56 }}>
        {formula ? 'Save changes' : 'Save formula'}
      </Button>
      <Stack direction="row" spacing={1} sx={{ flexWrap: 'wrap' }}>
        <Button
          component={RouterLink}
          to={`/formulas/water-temperature${waterG > 0 ? `?waterG=${Math.round(waterG)}` : ''}`}
          startIcon={<ThermostatOutlined />}
        >
          Water temperature
        </Button>
        {formula && (
          <Button component={RouterLink} to={`/formulas/${formula.id}/print`} startIcon={<PrintOutlined />}>
            Print view
          </Button>
        )}
      </Stack>
      {formula && <DeleteFormulaButton formulaId={formula.id} name={formula.name} />}
    </Stack>
  );
}
