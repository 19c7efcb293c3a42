import type { BakePlanView, Feeding, UnitSystem } from '@peakwise/shared';
import { useQuery } from '@tanstack/react-query';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Rating from '@mui/material/Rating';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { FormAlert } from '@/components/form/form-alert';
import { mapServerErrors } from '@/lib/form-errors';
import { useIdempotencyKey } from '@/lib/idempotency';
import { feedingsQueryOptions } from '@/lib/logbook/get-feedings';
import { formatWeights } from '@/lib/format/units';
import { useFinishPlan } from '../api/plan-writes';
import { formatWhen, type ClockOptions } from '../utils/clock';

interface Props {
  plan: BakePlanView;
  clock: ClockOptions;
  now: Date;
  unitSystem: UnitSystem;
}

/** The feeding most likely to have leavened it: the latest one fed before the dough was mixed. */
export function likelyFeeding(feedings: readonly Feeding[], mixAt: string): Feeding | undefined {
  const mix = Date.parse(mixAt);
  return [...feedings]
    .filter((f) => Date.parse(f.fedAt) <= mix)
    .sort((a, b) => Date.parse(b.fedAt) - Date.parse(a.fedAt))[0];
}

/** After the last step: how it went, a rating and the feeding behind it — the bake's record. */
export function FinishForm({ plan, clock, now, unitSystem }: Props) {
  const finish = useFinishPlan(plan.id);
  const key = useIdempotencyKey();
  const [notes, setNotes] = useState('');
  const [rating, setRating] = useState<number | null>(null);
  const [feedingId, setFeedingId] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const feedings = useQuery({
    ...feedingsQueryOptions(plan.cultureId ?? '', { limit: 10, order: 'desc' }),
    enabled: plan.cultureId !== null,
  });
  const items = feedings.data?.items ?? [];
  const mixAt = plan.live.steps.find((s) => s.kind === 'mix')?.startAt ?? plan.timing.mixAt;
  // Until the baker picks, the feeding just before mixing is the one meant.
  const chosen = feedingId ?? likelyFeeding(items, mixAt)?.id ?? '';

  const onSave = async (picked: string) => {
    setError(null);
    try {
      await finish.mutateAsync({
        body: { notes: notes.trim() === '' ? null : notes.trim(), rating, feedingId: picked === '' ? null : picked },
        headers: key.headers(),
      });
      key.settle();
    } catch (e) {
      key.settle(e);
      const { fieldErrors, formMessage } = mapServerErrors(e, ['notes', 'rating', 'feedingId']);
      setError([...fieldErrors.map((f) => f.message), formMessage].filter(Boolean).join(' '));
    }
  };

  return (
    <Card component="section" aria-labelledby="finish-heading" sx={{ borderColor: 'secondary.main' }}>
      <CardContent>
        <Stack
          component="form"
          spacing={2}
          onSubmit={(e) => {
            e.preventDefault();
            void onSave(chosen);
          }}
        >
          <Typography variant="h3" component="h2" id="finish-heading">
            Finish the bake
          </Typography>
          <Stack spacing={0.5}>
            <Typography component="legend" variant="body2" id="rating-label">
              How did it turn out?
            </Typography>
            <Rating value={rating} onChange={(_, v) => setRating(v)} size="large" aria-labelledby="rating-label" />
          </Stack>
          <TextField
            label="Notes"
            multiline
            minRows={3}
            value={notes}
            onChange={(e) => setNotes(e.target.value)}
            helperText="Crumb, crust, what the dough felt like, what to change next time."
          />
          {plan.cultureId && (
            <TextField
              select
              label={`The feeding of ${plan.cultureName ?? 'the culture'} that leavened it`}
              value={chosen}
              onChange={(e) => setFeedingId(e.target.value)}
              helperText="Links this bake to the culture’s log."
              slotProps={{ select: { native: true }, inputLabel: { shrink: true } }}
              disabled={feedings.isPending}
            >
              <option value="">None</option>
              {items.map((f) => (
                <option key={f.id} value={f.id}>
                  Fed {formatWhen(f.fedAt, now, clock)} · {formatWeights([f.starterG, f.flourG, f.waterG], unitSystem)}
                </option>
              ))}
            </TextField>
          )}
          <FormAlert message={error ?? undefined} />
          <Button type="submit" variant="contained" size="large" loading={finish.isPending}>
            Save the bake
          </Button>
        </Stack>
      </CardContent>
    </Card>
  );
}
