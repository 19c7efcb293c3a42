import type { Account, BakePlanListItem } from '@peakwise/shared';
import Add from '@mui/icons-material/Add';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardActionArea from '@mui/material/CardActionArea';
import CardContent from '@mui/material/CardContent';
import Chip from '@mui/material/Chip';
import Skeleton from '@mui/material/Skeleton';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { LoadError } from '@/components/feedback/load-error';
import { PageLoader } from '@/components/feedback/page-loader';
import { Page } from '@/components/layout/page';
import { useSignedInAccount } from '@/lib/auth/use-signed-in-account';
import { useNow } from '@/lib/use-now';
import { usePlan } from '../api/get-plan';
import { usePlans } from '../api/get-plans';
import { clockStyleFor, formatWhen, type ClockOptions } from '../utils/clock';
import { stepTitle } from '../utils/step-words';
import { currentStep } from '../utils/timeline';

const PAST_LIMIT = 30;

function listLine(item: BakePlanListItem): string {
  return [item.formulaName ?? 'Formula deleted', item.cultureName].filter(Boolean).join(' · ');
}

/** An active plan with what to do next and when (read from its live re-plan). */
function ActivePlanCard({ item, clock, now }: { item: BakePlanListItem; clock: ClockOptions; now: Date }) {
  const plan = usePlan(item.id);
  const next = plan.data ? currentStep(plan.data.live.steps) : null;
  const overdue = next !== null && Date.parse(next.startAt) <= now.getTime();
  return (
    <Card data-testid="active-plan" sx={{ borderColor: 'secondary.main', borderWidth: 2 }}>
      <CardActionArea component={RouterLink} to={`/bench/${item.id}`}>
        <CardContent>
          <Typography variant="h3" component="h3">
            {item.name}
          </Typography>
          <Typography variant="body2" color="text.secondary">
            {listLine(item)}
          </Typography>
          {plan.isPending ? (
            <Skeleton width="70%" />
          ) : next ? (
            <Typography sx={{ mt: 1, fontWeight: 500 }}>
              Next: {stepTitle(next)} — {overdue ? 'now' : formatWhen(next.startAt, now, clock)}
            </Typography>
          ) : (
            <Typography sx={{ mt: 1, fontWeight: 500 }}>Every step done — finish the bake.</Typography>
          )}
          {plan.data?.live.readyAt && (
            <Typography variant="body2" color="text.secondary">
              Ready {formatWhen(plan.data.live.readyAt, now, clock)}
            </Typography>
          )}
        </CardContent>
      </CardActionArea>
    </Card>
  );
}

function PastPlanCard({ item, clock, now }: { item: BakePlanListItem; clock: ClockOptions; now: Date }) {
  return (
    <Card data-testid="past-plan">
      <CardActionArea component={RouterLink} to={`/bench/${item.id}`}>
        <CardContent>
          <Stack direction="row" spacing={1} sx={{ alignItems: 'center' }}>
            <Typography variant="body1" sx={{ fontWeight: 500, flex: 1 }}>
              {item.name}
            </Typography>
            {item.status === 'cancelled' && <Chip size="small" label="Cancelled" />}
          </Stack>
          <Typography variant="body2" color="text.secondary">
            {listLine(item)}
            {item.readyAt ? ` · ${formatWhen(item.readyAt, now, clock)}` : ''}
          </Typography>
        </CardContent>
      </CardActionArea>
    </Card>
  );
}

/** The Bench: bakes under way first, with their next step; past bakes below. */
export function BenchListPage() {
  const account: Account = useSignedInAccount();
  const now = useNow();
  const active = usePlans({ status: 'active', limit: 20 });
  const all = usePlans({ limit: PAST_LIMIT });
  const clock = { timeZone: account.timeZone, style: clockStyleFor(account.unitSystem) };

  if (active.isPending || all.isPending) return <PageLoader />;
  if (active.isError) return <LoadError error={active.error} onRetry={() => void active.refetch()} />;
  if (all.isError) return <LoadError error={all.error} onRetry={() => void all.refetch()} />;
  const past = all.data.items.filter((p) => p.status !== 'active');

  return (
    <Page title="Bench" intro="Your bakes under way, step by step, and the ones before.">
      <Button
        component={RouterLink}
        to="/bench/new"
        variant="contained"
        size="large"
        startIcon={<Add />}
        sx={{ alignSelf: 'flex-start' }}
      >
        Plan a bake
      </Button>
      <Stack spacing={1.5} component="section" aria-labelledby="active-heading">
        <Typography variant="h2" id="active-heading">
          Under way
        </Typography>
        {active.data.items.length === 0 ? (
          <Typography color="text.secondary">Nothing on the bench. Plan a bake to get its times.</Typography>
        ) : (
          active.data.items.map((item) => <ActivePlanCard key={item.id} item={item} clock={clock} now={now} />)
        )}
      </Stack>
      {past.length > 0 && (
        <Stack spacing={1} component="section" aria-labelledby="past-heading">
          <Typography variant="h2" id="past-heading">
            Past bakes
          </Typography>
          {past.map((item) => (
            <PastPlanCard key={item.id} item={item} clock={clock} now={now} />
          ))}
        </Stack>
      )}
    </Page>
  );
}
