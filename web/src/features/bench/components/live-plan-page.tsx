import type { Account, BakePlanView, PlanStep } from '@peakwise/shared';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Rating from '@mui/material/Rating';
import Snackbar from '@mui/material/Snackbar';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { LoadError } from '@/components/feedback/load-error';
import { PageLoader } from '@/components/feedback/page-loader';
import { Page } from '@/components/layout/page';
import { isApiError } from '@/lib/api-client';
import { useSignedInAccount } from '@/lib/auth/use-signed-in-account';
import { useIdempotencyKey } from '@/lib/idempotency';
import { useNow } from '@/lib/use-now';
import { usePlan } from '../api/get-plan';
import { useCheckOffStep, useUndoStep } from '../api/plan-writes';
import { clockStyleFor, formatWhen, type ClockOptions } from '../utils/clock';
import { stepTitle } from '../utils/step-words';
import { allDone } from '../utils/timeline';
import { BulkCard } from './bulk-card';
import { FinishForm } from './finish-form';
import { KitchenCard } from './kitchen-card';
import { LiveTimeline } from './live-timeline';
import { PlanActions } from './plan-actions';

/** One plan, live: the timeline with the now-marker, check-offs, the bulk and its readings. */
export function LivePlanPage({ planId }: { planId: string }) {
  const account = useSignedInAccount();
  const plan = usePlan(planId);
  if (plan.isPending) return <PageLoader />;
  if (plan.isError) return <LoadError error={plan.error} onRetry={() => void plan.refetch()} />;
  return <LivePlan plan={plan.data} account={account} />;
}

/** "the retard runs …" → "The retard runs …": the planner's warnings are sentence tails. */
const sentence = (text: string) => text.charAt(0).toUpperCase() + text.slice(1);

/** What the name does not say already: the formula, the culture, and a ready time that moved. */
function subtitle(plan: BakePlanView, clock: ClockOptions, now: Date): string {
  const parts: string[] = [];
  if (!plan.formulaName) parts.push('formula deleted');
  else if (!plan.name.includes(plan.formulaName)) parts.push(plan.formulaName);
  parts.push(plan.cultureName ? `leavened by ${plan.cultureName}` : 'no culture (typical times)');
  const ready = plan.live.readyAt;
  const planned = plan.timing.readyAt;
  if (ready && plan.status === 'active') {
    const moved = planned !== null && Math.abs(Date.parse(ready) - Date.parse(planned)) >= 60_000;
    if (moved) parts.push(`now ready ${formatWhen(ready, now, clock)}`);
    else if (!/ready/i.test(plan.name)) parts.push(`ready ${formatWhen(ready, now, clock)}`);
  }
  return sentence(parts.join(' · '));
}

function LivePlan({ plan, account }: { plan: BakePlanView; account: Account }) {
  const clientNow = useNow();
  // The server's re-plan may be a moment ahead of the last tick (a check-off just recorded).
  const now = new Date(Math.max(clientNow.getTime(), Date.parse(plan.live.now)));
  const clock = { timeZone: account.timeZone, style: clockStyleFor(account.unitSystem) };
  const active = plan.status === 'active';
  const check = useCheckOffStep(plan.id);
  const undo = useUndoStep(plan.id);
  const key = useIdempotencyKey();
  const [busyStep, setBusyStep] = useState<string | null>(null);
  const [toast, setToast] = useState<{ text: string; step?: PlanStep } | null>(null);
  const [error, setError] = useState<string | null>(null);

  const onDone = async (step: PlanStep, at?: string) => {
    setBusyStep(step.id);
    setError(null);
    try {
      await check.mutateAsync({
        stepId: step.id,
        body: at ? { startedAt: at, endedAt: at } : {},
        headers: key.headers(),
      });
      key.settle();
      setToast({ text: `${stepTitle(step)} — done`, step });
    } catch (e) {
      key.settle(e);
      setError(isApiError(e) ? e.message : 'That did not save. Try again.');
    } finally {
      setBusyStep(null);
    }
  };

  const onUndo = async (step: PlanStep) => {
    setBusyStep(step.id);
    setToast(null);
    try {
      await undo.mutateAsync(step.id);
    } catch (e) {
      setError(isApiError(e) ? e.message : 'That did not undo. Try again.');
    } finally {
      setBusyStep(null);
    }
  };

  const upFront = active && (plan.live.bulk.status === 'fermenting' || allDone(plan.live.steps));

  return (
    <Page title={plan.name} intro={subtitle(plan, clock, now)}>
      {plan.status === 'cancelled' && <Alert severity="info">This plan was cancelled.</Alert>}
      {plan.status === 'finished' && (
        <Card>
          <CardContent>
            <Stack spacing={1}>
              <Typography variant="h3" component="h2">
                Baked{plan.finishedAt ? ` ${formatWhen(plan.finishedAt, now, clock)}` : ''}
              </Typography>
              {plan.rating !== null && <Rating value={plan.rating} readOnly aria-label={`Rated ${plan.rating} of 5`} />}
              {plan.notes && <Typography sx={{ whiteSpace: 'pre-wrap' }}>{plan.notes}</Typography>}
            </Stack>
          </CardContent>
        </Card>
      )}
      {active &&
        plan.live.warnings.map((w) => (
          <Alert key={w} severity="warning">
            {sentence(w)}
          </Alert>
        ))}
      {error && (
        <Alert severity="error" onClose={() => setError(null)}>
          {error}
        </Alert>
      )}
      <Stack direction={{ xs: 'column', md: 'row' }} spacing={3} sx={{ alignItems: { md: 'flex-start' } }}>
        <Card sx={{ flex: { md: '1 1 60%' }, minWidth: 0 }}>
          <CardContent>
            <LiveTimeline
              plan={plan}
              clock={clock}
              now={now}
              unit={account.temperatureUnit}
              active={active}
              busyStep={busyStep}
              onDone={(s, at) => void onDone(s, at)}
              onUndo={(s) => void onUndo(s)}
            />
          </CardContent>
        </Card>
        {/* On a phone, the bulk card (readings) and the finish form come before the long timeline while they matter. */}
        <Stack spacing={3} sx={{ flex: { md: '1 1 40%' }, minWidth: 0, order: { xs: upFront ? -1 : 0, md: 0 } }}>
          {active && allDone(plan.live.steps) && (
            <FinishForm plan={plan} clock={clock} now={now} unitSystem={account.unitSystem} />
          )}
          <BulkCard plan={plan} account={account} clock={clock} now={now} active={active} />
          <KitchenCard plan={plan} clock={clock} now={now} editable />
          <PlanActions plan={plan} active={active} />
        </Stack>
      </Stack>
      <Snackbar
        open={toast !== null}
        autoHideDuration={8000}
        onClose={() => setToast(null)}
        message={toast?.text}
        sx={{ bottom: { xs: 72, md: 24 } }}
        action={
          toast?.step ? (
            <Button color="secondary" size="small" onClick={() => toast.step && void onUndo(toast.step)}>
              Undo
            </Button>
          ) : undefined
        }
      />
    </Page>
  );
}
