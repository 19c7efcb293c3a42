import type { Account, Culture, FormulaListItem } from '@peakwise/shared';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import FormControlLabel from '@mui/material/FormControlLabel';
import Link from '@mui/material/Link';
import Stack from '@mui/material/Stack';
import Switch from '@mui/material/Switch';
import ToggleButton from '@mui/material/ToggleButton';
import ToggleButtonGroup from '@mui/material/ToggleButtonGroup';
import Typography from '@mui/material/Typography';
import type { ReactNode } from 'react';
import { Controller, useWatch, type Control } from 'react-hook-form';
import { Link as RouterLink } from 'react-router-dom';
import { FormTextField } from '@/components/form/form-text-field';
import { unitSlotProps } from '@/components/form/unit-slot-props';
import { bigToggleSx } from '@/components/logbook/toggle-sx';
import type { PlanFormValues } from '../utils/plan-form';

const shrink = { inputLabel: { shrink: true } };

function Section({ title, children }: { title: string; children: ReactNode }) {
  return (
    <Card component="section">
      <CardContent>
        <Stack spacing={2}>
          <Typography variant="h3" component="h2">
            {title}
          </Typography>
          {children}
        </Stack>
      </CardContent>
    </Card>
  );
}

function SwitchField({
  control,
  name,
  label,
}: {
  control: Control<PlanFormValues>;
  name: 'quietOn' | 'starterRipe';
  label: string;
}) {
  return (
    <Controller
      control={control}
      name={name}
      render={({ field }) => (
        <FormControlLabel
          control={<Switch checked={field.value} onChange={(e) => field.onChange(e.target.checked)} />}
          label={label}
        />
      )}
    />
  );
}

interface Props {
  control: Control<PlanFormValues>;
  account: Account;
  formulas: FormulaListItem[];
  cultures: Culture[];
}

/** The new plan's inputs, grouped as a baker thinks of them: what, when, the dough, proof and bake. */
export function PlanFormFields({ control, account, formulas, cultures }: Props) {
  const mode = useWatch({ control, name: 'mode' });
  const quietOn = useWatch({ control, name: 'quietOn' });
  const proof = useWatch({ control, name: 'finalProof' });
  const tUnit = `°${account.temperatureUnit}`;

  return (
    <>
      <Section title="What you bake">
        <FormTextField
          control={control}
          name="formulaId"
          label="Formula"
          select
          slotProps={{ select: { native: true }, ...shrink }}
        >
          <option value="">Pick a formula</option>
          {formulas.map((f) => (
            <option key={f.id} value={f.id}>
              {f.name}
            </option>
          ))}
        </FormTextField>
        {formulas.length === 0 && (
          <Typography variant="body2">
            No formulas yet —{' '}
            <Link component={RouterLink} to="/formulas/new">
              write one first
            </Link>
            .
          </Typography>
        )}
        <FormTextField
          control={control}
          name="cultureId"
          label="Culture that leavens it"
          select
          helperText="Its own feedings time the levain and the bulk; without one, typical times are used."
          slotProps={{ select: { native: true }, ...shrink }}
        >
          <option value="">No culture (typical times)</option>
          {cultures.map((c) => (
            <option key={c.id} value={c.id}>
              {c.name}
            </option>
          ))}
        </FormTextField>
        <SwitchField control={control} name="starterRipe" label="My levain is ripe already (no feeding step)" />
      </Section>

      <Section title="When">
        <Controller
          control={control}
          name="mode"
          render={({ field }) => (
            <ToggleButtonGroup
              exclusive
              fullWidth
              value={field.value}
              onChange={(_, v: PlanFormValues['mode'] | null) => v && field.onChange(v)}
              aria-label="Plan from"
            >
              <ToggleButton value="ready-at" sx={bigToggleSx}>
                Ready at…
              </ToggleButton>
              <ToggleButton value="start-now" sx={bigToggleSx}>
                Start now
              </ToggleButton>
            </ToggleButtonGroup>
          )}
        />
        {mode === 'ready-at' && (
          <FormTextField
            control={control}
            name="readyAt"
            label="Bread ready at"
            type="datetime-local"
            helperText={`Cooled and ready to slice. Times are in ${account.timeZone}.`}
            slotProps={shrink}
          />
        )}
        <SwitchField control={control} name="quietOn" label="Keep my quiet hours free (no hands-on steps)" />
        {quietOn && (
          <Stack direction="row" spacing={1}>
            <FormTextField control={control} name="quietFrom" label="Quiet from" type="time" slotProps={shrink} />
            <FormTextField control={control} name="quietUntil" label="Until" type="time" slotProps={shrink} />
          </Stack>
        )}
      </Section>

      <Section title="Dough and folds">
        <FormTextField
          control={control}
          name="doughTemperature"
          label="Dough temperature during bulk"
          helperText="Where the dough will sit; warmer dough ferments faster."
          slotProps={unitSlotProps(tUnit)}
        />
        <Stack direction="row" spacing={1}>
          <FormTextField
            control={control}
            name="foldSets"
            label="Stretch-and-fold sets"
            slotProps={unitSlotProps('sets', 'numeric')}
          />
          <FormTextField
            control={control}
            name="foldInterval"
            label="Every"
            slotProps={unitSlotProps('min', 'numeric')}
          />
        </Stack>
      </Section>

      <Section title="Proof and bake">
        <Controller
          control={control}
          name="finalProof"
          render={({ field }) => (
            <ToggleButtonGroup
              exclusive
              fullWidth
              value={field.value}
              onChange={(_, v: PlanFormValues['finalProof'] | null) => v && field.onChange(v)}
              aria-label="Final proof"
            >
              <ToggleButton value="room" sx={bigToggleSx}>
                On the counter
              </ToggleButton>
              <ToggleButton value="retard" sx={bigToggleSx}>
                Cold retard
              </ToggleButton>
            </ToggleButtonGroup>
          )}
        />
        <Typography variant="body2" color="text.secondary">
          You will see both ways; the one you pick here comes first when both fit.
        </Typography>
        {proof === 'room' ? (
          <FormTextField
            control={control}
            name="proofHours"
            label="Final proof"
            helperText="Leave empty to let Peakwise work it out from the bulk."
            slotProps={unitSlotProps('h')}
          />
        ) : (
          <>
            <FormTextField
              control={control}
              name="fridgeTemperature"
              label="Fridge temperature"
              slotProps={unitSlotProps(tUnit)}
            />
            <Stack direction="row" spacing={1}>
              <FormTextField
                control={control}
                name="retardMinHours"
                label="In the fridge at least"
                slotProps={unitSlotProps('h')}
              />
              <FormTextField control={control} name="retardMaxHours" label="At most" slotProps={unitSlotProps('h')} />
            </Stack>
          </>
        )}
        <FormTextField
          control={control}
          name="ovenTemperature"
          label="Oven temperature"
          slotProps={unitSlotProps(tUnit)}
        />
        <Stack direction="row" spacing={1}>
          <FormTextField
            control={control}
            name="bakeMinMinutes"
            label="Bake from"
            slotProps={unitSlotProps('min', 'numeric')}
          />
          <FormTextField
            control={control}
            name="bakeMaxMinutes"
            label="To"
            slotProps={unitSlotProps('min', 'numeric')}
          />
        </Stack>
      </Section>
    </>
  );
}
