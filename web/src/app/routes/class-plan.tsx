import type { BakePlanView } from '@peakwise/shared';
import Alert from '@mui/material/Alert';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Link from '@mui/material/Link';
import Rating from '@mui/material/Rating';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink, useParams } from 'react-router-dom';
import { LoadError } from '@/components/feedback/load-error';
import { PageLoader } from '@/components/feedback/page-loader';
import { Page } from '@/components/layout/page';
import { BulkCard } from '@/features/bench/components/bulk-card';
import { KitchenCard } from '@/features/bench/components/kitchen-card';
import { LiveTimeline } from '@/features/bench/components/live-timeline';
import { clockStyleFor, formatWhen, type ClockOptions } from '@/features/bench/utils/clock';
import { useClassPlan } from '@/features/classroom/api/get-class-plan';
import { CommentThread } from '@/features/comments/components/comment-thread';
import { PhotosCard } from '@/features/photos/components/photos-card';
import { useSignedInAccount } from '@/lib/auth/use-signed-in-account';
import { useNow } from '@/lib/use-now';

const STATUS: Record<BakePlanView['status'], string> = {
  active: 'In progress',
  finished: 'Baked',
  cancelled: 'Cancelled',
};

const nothing = () => undefined;

function intro(plan: BakePlanView, clock: ClockOptions, now: Date): string {
  const parts = [STATUS[plan.status]];
  if (plan.formulaName && !plan.name.includes(plan.formulaName)) parts.push(plan.formulaName);
  parts.push(plan.cultureName ? `leavened by ${plan.cultureName}` : 'no culture (typical times)');
  // The default name says the ready time already.
  if (plan.status === 'active' && plan.live.readyAt && !/ready/i.test(plan.name))
    parts.push(`ready ${formatWhen(plan.live.readyAt, now, clock)}`);
  if (plan.status === 'finished' && plan.finishedAt) parts.push(`baked ${formatWhen(plan.finishedAt, now, clock)}`);
  return parts.join(' · ');
}

/** A student's bake for the class's instructor: the live timeline and bulk, read-only, and the thread. */
export function ClassPlanRoute() {
  const { classId = '', planId = '' } = useParams();
  const account = useSignedInAccount();
  const plan = useClassPlan(classId, planId);
  const clientNow = useNow();

  if (plan.isPending) return <PageLoader />;
  if (plan.isError) return <LoadError error={plan.error} onRetry={() => void plan.refetch()} />;
  const p = plan.data;
  const now = new Date(Math.max(clientNow.getTime(), Date.parse(p.live.now)));
  // The viewer's clock and units, not the student's.
  const clock = { timeZone: account.timeZone, style: clockStyleFor(account.unitSystem) };
  const active = p.status === 'active';

  return (
    <Page title={p.name} documentTitle="Student’s bake" intro={intro(p, clock, now)}>
      <Alert severity="info">
        Read-only: shared with you as this class’s instructor.{' '}
        <Link component={RouterLink} to={`/classes/${classId}`}>
          Back to the class
        </Link>{' '}
        · {/* On a phone the thread sits below the whole timeline. */}
        <Link href="#comments">Go to the comments</Link>
      </Alert>
      {p.status === 'finished' && (p.rating !== null || p.notes) && (
        <Card>
          <CardContent>
            <Stack spacing={1}>
              <Typography variant="h3" component="h2">
                How it came out
              </Typography>
              {p.rating !== null && <Rating value={p.rating} readOnly aria-label={`Rated ${p.rating} of 5`} />}
              {p.notes && <Typography sx={{ whiteSpace: 'pre-wrap' }}>{p.notes}</Typography>}
            </Stack>
          </CardContent>
        </Card>
      )}
      <Stack direction={{ xs: 'column', md: 'row' }} spacing={3} sx={{ alignItems: { md: 'flex-start' } }}>
        <Card sx={{ flex: { md: '1 1 60%' }, minWidth: 0 }}>
          <CardContent>
            <LiveTimeline
              plan={p}
              clock={clock}
              now={now}
              unit={account.temperatureUnit}
              active={active}
              busyStep={null}
              onDone={nothing}
              onUndo={nothing}
              readOnly
            />
          </CardContent>
        </Card>
        <Stack spacing={3} sx={{ flex: { md: '1 1 40%' }, minWidth: 0 }}>
          <BulkCard plan={p} account={account} clock={clock} now={now} active={false} />
          <KitchenCard plan={p} clock={clock} now={now} editable={false} />
          <PhotosCard subject={{ type: 'bake-plan', id: p.id }} readOnly />
          <CommentThread
            key={p.id}
            id="comments"
            subject={{ type: 'bake-plan', id: p.id }}
            timeZone={account.timeZone}
            heading="Comments"
            emptyText="No comments yet. Your student gets an alert when you write, and can reply here."
            formLabel="Comment for your student"
          />
        </Stack>
      </Stack>
    </Page>
  );
}
