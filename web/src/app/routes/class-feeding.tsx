import Alert from '@mui/material/Alert';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Link from '@mui/material/Link';
import Typography from '@mui/material/Typography';
import { useQuery } from '@tanstack/react-query';
import { Link as RouterLink, useParams } from 'react-router-dom';
import { LoadError } from '@/components/feedback/load-error';
import { PageLoader } from '@/components/feedback/page-loader';
import { Page } from '@/components/layout/page';
import { classCultureQueryOptions } from '@/features/classroom/api/get-class-culture';
import { useClassFeeding } from '@/features/classroom/api/get-class-feeding';
import { classRiseChecksQueryKey, getClassRiseChecks } from '@/features/classroom/api/get-class-rise-checks';
import { CommentThread } from '@/features/comments/components/comment-thread';
import { FeedingRecord } from '@/features/feeding-detail/components/feeding-record';
import { RiseChecksCard } from '@/features/feeding-detail/components/rise-checks-card';
import { formatWhen } from '@/features/feeding-detail/utils/feeding-words';
import { PhotosCard } from '@/features/photos/components/photos-card';
import { useSignedInAccount } from '@/lib/auth/use-signed-in-account';

/** A student's feeding for the class's instructor: as recorded, its rise checks, and the thread. */
export function ClassFeedingRoute() {
  const { classId = '', feedingId = '' } = useParams();
  const account = useSignedInAccount();
  const feeding = useClassFeeding(classId, feedingId);
  const checks = useQuery({
    queryKey: classRiseChecksQueryKey(classId, feedingId),
    queryFn: () => getClassRiseChecks(classId, feedingId),
  });
  const cultureId = feeding.data?.cultureId;
  const culture = useQuery({ ...classCultureQueryOptions(classId, cultureId ?? ''), enabled: cultureId !== undefined });

  if (feeding.isPending) return <PageLoader />;
  if (feeding.isError) return <LoadError error={feeding.error} onRetry={() => void feeding.refetch()} />;
  const f = feeding.data;
  const name = culture.data?.name ?? 'its culture';

  return (
    <Page
      title={culture.data ? `Feeding · ${culture.data.name}` : 'Feeding'}
      documentTitle="Student’s feeding"
      intro={
        <>
          Fed {formatWhen(f.fedAt, account.timeZone)}. Back to{' '}
          <Link component={RouterLink} to={`/classes/${classId}/cultures/${f.cultureId}`}>
            {name}
          </Link>
          .
        </>
      }
    >
      <Alert severity="info">Read-only: shared with you as this class’s instructor.</Alert>
      <Card>
        <CardContent>
          <Typography variant="h2" gutterBottom>
            As recorded
          </Typography>
          <FeedingRecord feeding={f} account={account} readOnly />
        </CardContent>
      </Card>
      <RiseChecksCard feeding={f} account={account} readOnly={{ checks }} />
      <PhotosCard subject={{ type: 'feeding', id: f.id }} readOnly />
      <CommentThread
        key={f.id}
        subject={{ type: 'feeding', id: f.id }}
        timeZone={account.timeZone}
        heading="Comments"
        emptyText="No comments yet. Your student gets an alert when you write, and can reply here."
        formLabel="Comment for your student"
      />
    </Page>
  );
}
