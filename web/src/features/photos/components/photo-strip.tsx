import type { FeedingListQuery, FeedingListResponse, Photo } from '@peakwise/shared';
import Box from '@mui/material/Box';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Link from '@mui/material/Link';
import Skeleton from '@mui/material/Skeleton';
import Typography from '@mui/material/Typography';
import { useQuery } from '@tanstack/react-query';
import { useEffect, useId, useMemo, useRef, useState } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import { LoadError } from '@/components/feedback/load-error';
import { useSignedInAccount } from '@/lib/auth/use-signed-in-account';
import { getFeedings } from '@/lib/logbook/get-feedings';
import { logbookKeys } from '@/lib/logbook/query-keys';
import { usePhotos } from '../api/get-photos';
import {
  clockStyle,
  formatPhotoClock,
  formatPhotoDay,
  formatPhotoTime,
  groupByFeeding,
  shownAt,
} from '../utils/photo-words';
import { PhotoThumb } from './photo-thumb';
import { PhotoViewer } from './photo-viewer';

type Fetch<T> = { queryKey: readonly unknown[]; queryFn: () => Promise<T> };

interface PhotoStripProps {
  cultureId: string;
  /** Where a feeding's page is: the owner's, or the class's read-only one. */
  feedingHref?: (feedingId: string) => string;
  /** Where the culture's feedings come from when they are not the viewer's own (a class's routes). */
  source?: { feedings: (query: FeedingListQuery) => Fetch<FeedingListResponse> };
  readOnly?: boolean;
}

const THUMB = 112;
// Enough feedings to name the ones photos were taken of; older photos say just "a feeding".
const FEEDINGS_QUERY = { limit: 200, order: 'desc' } as const;

/**
 * The culture's jar photos in time order, a strip that scrolls sideways and opens at the newest,
 * each run of photos under the feeding it belongs to, so the rise curves above have a picture.
 */
export function PhotoStrip({ cultureId, feedingHref, source, readOnly = false }: PhotoStripProps) {
  const account = useSignedInAccount();
  const headingId = useId();
  const photos = usePhotos({ type: 'culture', id: cultureId });
  const feedings = useQuery(
    source?.feedings(FEEDINGS_QUERY) ?? {
      queryKey: logbookKeys.feedings(cultureId, { ...FEEDINGS_QUERY }),
      queryFn: () => getFeedings(cultureId, FEEDINGS_QUERY),
    },
  );
  const [open, setOpen] = useState<number | null>(null);
  const scroller = useRef<HTMLDivElement>(null);
  const style = clockStyle(account.unitSystem);
  const when = (iso: string) => formatPhotoTime(iso, account.timeZone, style);

  const groups = useMemo(() => groupByFeeding(photos.data?.items ?? []), [photos.data]);
  const ordered = useMemo(() => groups.flatMap((g) => g.photos), [groups]);
  const fedAt = useMemo(() => new Map((feedings.data?.items ?? []).map((f) => [f.id, f.fedAt])), [feedings.data]);
  const feedingLabel = (feedingId: string) => {
    const at = fedAt.get(feedingId);
    return at ? `feeding of ${when(at)}` : 'its feeding';
  };
  // The group's own label is narrow (one thumbnail wide at least): "Fed 2 Dec, 05:09".
  const shortLabel = (feedingId: string) => {
    const at = fedAt.get(feedingId);
    return at
      ? `Fed ${formatPhotoDay(at, account.timeZone)}, ${formatPhotoClock(at, account.timeZone, style)}`
      : 'Feeding';
  };
  const link = (photo: Photo) =>
    photo.feedingId && feedingHref
      ? { href: feedingHref(photo.feedingId), label: feedingLabel(photo.feedingId) }
      : null;

  // Newest on the right, in view first: the latest jar is the one a baker looks for.
  useEffect(() => {
    const el = scroller.current;
    if (el) el.scrollLeft = el.scrollWidth;
  }, [ordered.length]);

  if (photos.isSuccess && ordered.length === 0 && readOnly) return null;

  return (
    <Card component="section" aria-labelledby={headingId} data-testid="photo-strip">
      <CardContent>
        <Typography id={headingId} variant="h2" gutterBottom>
          Jar photos
        </Typography>
        {photos.isPending && <Skeleton variant="rounded" height={THUMB + 48} />}
        {photos.isError && <LoadError error={photos.error} onRetry={() => void photos.refetch()} />}
        {photos.isSuccess && ordered.length === 0 && (
          <Typography color="text.secondary">
            No jar photos yet. Add them on a feeding’s page: a picture at the start and one at the peak shows the rise.
          </Typography>
        )}
        {ordered.length > 0 && (
          <>
            <Typography variant="body2" color="text.secondary" sx={{ mb: 1 }}>
              Oldest to newest, by feeding. {ordered.length} {ordered.length === 1 ? 'photo' : 'photos'}.
            </Typography>
            <Box
              ref={scroller}
              role="list"
              aria-label="Jar photos in time order"
              tabIndex={0}
              sx={{ display: 'flex', gap: 2, overflowX: 'auto', pb: 1, scrollSnapType: 'x proximity' }}
            >
              {groups.map((group) => (
                <Box
                  key={`${group.feedingId ?? 'none'}-${group.photos[0]!.id}`}
                  role="listitem"
                  sx={{ flexShrink: 0, borderLeft: 3, borderColor: 'secondary.main', pl: 1 }}
                >
                  <Typography
                    variant="body2"
                    sx={{ mb: 0.5, fontWeight: 500, maxWidth: group.photos.length * (THUMB + 8) - 8 }}
                  >
                    {group.feedingId && feedingHref ? (
                      <Link component={RouterLink} to={feedingHref(group.feedingId)}>
                        {shortLabel(group.feedingId)}
                      </Link>
                    ) : (
                      'Not of a feeding'
                    )}
                  </Typography>
                  <Box sx={{ display: 'flex', gap: 1 }}>
                    {group.photos.map((photo) => (
                      <Box key={photo.id} sx={{ width: THUMB, scrollSnapAlign: 'start' }}>
                        <PhotoThumb
                          photo={photo}
                          size={THUMB}
                          when={when(shownAt(photo))}
                          onOpen={() => setOpen(ordered.indexOf(photo))}
                        />
                        <Typography variant="caption" color="text.secondary" component="p" noWrap>
                          {formatPhotoDay(shownAt(photo), account.timeZone)} ·{' '}
                          {formatPhotoClock(shownAt(photo), account.timeZone, style)}
                        </Typography>
                      </Box>
                    ))}
                  </Box>
                </Box>
              ))}
            </Box>
          </>
        )}
      </CardContent>
      <PhotoViewer
        photos={ordered}
        index={open}
        onIndexChange={setOpen}
        when={when}
        feedingLink={link}
        readOnly={readOnly}
      />
    </Card>
  );
}
