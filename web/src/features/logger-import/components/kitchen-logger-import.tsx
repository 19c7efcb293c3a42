import type { BakePlanView } from '@peakwise/shared';
import { useQueryClient } from '@tanstack/react-query';
import { LoadError } from '@/components/feedback/load-error';
import { PageLoader } from '@/components/feedback/page-loader';
import { usePlan } from '@/features/bench/api/get-plan';
import { benchKeys } from '@/features/bench/api/query-keys';
import { kitchenTarget } from '../api/add-readings';
import { LoggerImport } from './logger-import';

const HOUR = 3_600_000;

/** From an hour before the mix (a logger started ahead shows the room at mixing) to the bread being ready. */
export function bakeWindow(plan: BakePlanView): { startMs: number; hours: number } {
  const mix = plan.live.steps.find((s) => s.id === 'mix');
  const startMs = Date.parse(mix?.startAt ?? plan.timing.mixAt) - HOUR;
  const endMs = Date.parse(plan.finishedAt ?? plan.cancelledAt ?? plan.live.readyAt ?? new Date().toISOString());
  return { startMs, hours: Math.max(1, (endMs - startMs) / HOUR) };
}

/** A logger file onto a bake: the kitchen's temperatures, which the bulk forecast follows. */
export function KitchenLoggerImportPage({ planId }: { planId: string }) {
  const plan = usePlan(planId);
  const queryClient = useQueryClient();
  if (plan.isPending) return <PageLoader />;
  if (plan.isError) return <LoadError error={plan.error} onRetry={() => void plan.refetch()} />;
  return (
    <LoggerImport
      place="bake"
      target={kitchenTarget(planId)}
      window={bakeWindow(plan.data)}
      intro="A CSV from a kitchen temperature logger: one column of times, one of temperatures. The readings from an hour before the mix to the bread being ready are added to this bake. The dough follows the room slowly, so the bulk forecast uses them as the dough warming or cooling towards the room; dough temperatures you measure count for more."
      back={`/bench/${planId}`}
      backLabel="Back to the bake"
      doneTail="The bulk forecast and the steps after it now follow the room."
      onSettled={() => void queryClient.invalidateQueries({ queryKey: benchKeys.all })}
    />
  );
}
