import Box from '@mui/material/Box';
import Link from '@mui/material/Link';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { LoadError } from '@/components/feedback/load-error';
import { PageLoader } from '@/components/feedback/page-loader';
import { Page } from '@/components/layout/page';
import { useSignedInAccount } from '@/lib/auth/use-signed-in-account';
import { useNow } from '@/lib/use-now';
import { useClass } from '../api/get-class';
import { classWeek, classWeekWords, formatClassDates, todayIn } from '../utils/class-dates';
import { ClassChartCard } from './class-chart-card';
import { InvitesCard } from './invites-card';
import { JoinCodeCard } from './join-code-card';
import { MembersCard } from './members-card';
import { RosterCard } from './roster-card';
import { StudentClassView } from './student-class-view';

/** One class: for its instructor the roster first, then the chart, ways in, and who is in; for a student the plain facts. */
export function ClassPage({ classId }: { classId: string }) {
  const account = useSignedInAccount();
  const found = useClass(classId);
  const now = useNow(60_000);

  if (found.isPending) return <PageLoader label="Loading the class" />;
  if (found.isError) return <LoadError error={found.error} onRetry={() => void found.refetch()} />;
  const c = found.data;
  const teaching = c.role === 'instructor';
  const students = c.memberCount === 1 ? '1 student' : `${c.memberCount} students`;
  const intro = [
    classWeekWords(classWeek(c.startsOn, c.endsOn, todayIn(account.timeZone, now))),
    formatClassDates(c.startsOn, c.endsOn),
    teaching ? students : null,
  ]
    .filter(Boolean)
    .join(' · ');

  return (
    <Page title={c.name} intro={intro}>
      <Link component={RouterLink} to="/classes" sx={{ mt: -2 }}>
        ← All classes
      </Link>
      {teaching ? (
        <>
          {c.description && (
            <Typography color="text.secondary" sx={{ whiteSpace: 'pre-line' }}>
              {c.description}
            </Typography>
          )}
          <RosterCard classId={c.id} account={account} now={now} />
          <ClassChartCard classId={c.id} startsOn={c.startsOn} account={account} />
          <Box sx={{ display: 'grid', gap: 3, gridTemplateColumns: { xs: '1fr', md: '1fr 1fr' }, alignItems: 'start' }}>
            <JoinCodeCard bakingClass={c} />
            <InvitesCard classId={c.id} account={account} />
          </Box>
          <MembersCard classId={c.id} account={account} />
        </>
      ) : (
        <StudentClassView bakingClass={c} />
      )}
    </Page>
  );
}
