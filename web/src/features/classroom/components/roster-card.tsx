import { ROSTER_FLAGS, type Account, type RosterFlag, type RosterSort, type SortOrder } from '@peakwise/shared';
import Download from '@mui/icons-material/Download';
import Search from '@mui/icons-material/Search';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Chip from '@mui/material/Chip';
import InputAdornment from '@mui/material/InputAdornment';
import LinearProgress from '@mui/material/LinearProgress';
import Stack from '@mui/material/Stack';
import TablePagination from '@mui/material/TablePagination';
import MenuItem from '@mui/material/MenuItem';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { useTheme } from '@mui/material/styles';
import useMediaQuery from '@mui/material/useMediaQuery';
import { useEffect, useState } from 'react';
import { LoadError } from '@/components/feedback/load-error';
import { rosterCsvUrl, useRoster } from '../api/get-roster';
import { FLAG_WORDS } from '../utils/roster-words';
import { RosterList } from './roster-list';
import { RosterSummary } from './roster-summary';
import { RosterTable } from './roster-table';

// The direction a column starts in is the one that brings trouble to the top: the longest since
// feeding, the slowest to peak, the weakest rise, the most flags.
const FIRST_ORDER: Record<RosterSort, SortOrder> = {
  student: 'asc',
  lastFed: 'asc',
  hoursToPeak: 'desc',
  riseMultiple: 'asc',
  flags: 'desc',
  sluggish: 'desc',
};

/** The phone's sort menu: each column in the direction that brings trouble to the top. */
const SORT_WORDS: Record<RosterSort, string> = {
  sluggish: 'Sluggish first',
  flags: 'Most flags first',
  lastFed: 'Longest since feeding',
  hoursToPeak: 'Slowest to peak',
  riseMultiple: 'Weakest rise',
  student: 'Student name',
};

/** The search box's text once typing has paused, so each keystroke is not a request. */
function useSettled(text: string, ms = 300): string {
  const [settled, setSettled] = useState(text);
  useEffect(() => {
    const timer = setTimeout(() => setSettled(text), ms);
    return () => clearTimeout(timer);
  }, [text, ms]);
  return settled;
}

/** The instructor's table: who needs a look first, then every student culture, sortable and filterable. */
export function RosterCard({ classId, account, now }: { classId: string; account: Account; now: Date }) {
  // Sluggish first by default: the struggling starter is the reason this page is opened.
  const [sort, setSort] = useState<RosterSort>('sluggish');
  const [order, setOrder] = useState<SortOrder>('desc');
  const [flag, setFlag] = useState<RosterFlag | null>(null);
  const [search, setSearch] = useState('');
  const [page, setPage] = useState(0);
  const [rowsPerPage, setRowsPerPage] = useState(25);
  const q = useSettled(search.trim());
  const theme = useTheme();
  // Six columns need a wide screen; a phone gets one entry per culture instead.
  const wide = useMediaQuery(theme.breakpoints.up('md'), { noSsr: true });
  const roster = useRoster(classId, {
    sort,
    order,
    flag: flag ?? undefined,
    q: q || undefined,
    limit: rowsPerPage,
    offset: page * rowsPerPage,
  });
  // The summary reads the whole class, whatever the table is filtered to.
  const everyone = useRoster(classId, { sort: 'flags', order: 'desc', limit: 100 });

  const onSort = (next: RosterSort) => {
    if (next === sort) setOrder(order === 'asc' ? 'desc' : 'asc');
    else {
      setSort(next);
      setOrder(FIRST_ORDER[next]);
    }
    setPage(0);
  };

  return (
    <Card>
      <CardContent>
        <Stack spacing={2}>
          <Stack
            direction="row"
            sx={{ alignItems: 'center', justifyContent: 'space-between', flexWrap: 'wrap', gap: 1 }}
          >
            <Typography variant="h2">Roster</Typography>
            <Button
              startIcon={<Download />}
              href={rosterCsvUrl(classId, { sort, order, flag: flag ?? undefined, q: q || undefined })}
              download
              variant="outlined"
              size="small"
            >
              Download roster (CSV)
            </Button>
          </Stack>
          {everyone.data && <RosterSummary classId={classId} rows={everyone.data.items} />}
          <Stack direction="row" sx={{ flexWrap: 'wrap', gap: 1, alignItems: 'center' }}>
            {wide ? (
              <Chip
                label="Sluggish first"
                color={sort === 'sluggish' ? 'primary' : 'default'}
                variant={sort === 'sluggish' ? 'filled' : 'outlined'}
                onClick={() => onSort('sluggish')}
                aria-pressed={sort === 'sluggish'}
              />
            ) : (
              <TextField
                select
                size="small"
                label="Sort"
                value={sort}
                onChange={(e) => {
                  const next = e.target.value as RosterSort;
                  setSort(next);
                  setOrder(FIRST_ORDER[next]);
                  setPage(0);
                }}
                sx={{ minWidth: 200, flexGrow: 1 }}
              >
                {(Object.keys(SORT_WORDS) as RosterSort[]).map((key) => (
                  <MenuItem key={key} value={key}>
                    {SORT_WORDS[key]}
                  </MenuItem>
                ))}
              </TextField>
            )}
            <TextField
              size="small"
              label="Search student or culture"
              value={search}
              onChange={(e) => {
                setSearch(e.target.value);
                setPage(0);
              }}
              sx={{ flexGrow: 1, minWidth: 200 }}
              slotProps={{
                input: {
                  startAdornment: (
                    <InputAdornment position="start">
                      <Search fontSize="small" />
                    </InputAdornment>
                  ),
                },
              }}
            />
          </Stack>
          <Stack direction="row" sx={{ flexWrap: 'wrap', gap: 1 }} role="group" aria-label="Show only rows flagged">
            <Typography variant="body2" color="text.secondary" sx={{ alignSelf: 'center' }}>
              Show:
            </Typography>
            <Chip
              label="All"
              size="small"
              color={flag === null ? 'primary' : 'default'}
              variant={flag === null ? 'filled' : 'outlined'}
              onClick={() => {
                setFlag(null);
                setPage(0);
              }}
              aria-pressed={flag === null}
            />
            {ROSTER_FLAGS.map((f) => (
              <Chip
                key={f}
                label={FLAG_WORDS[f].label}
                size="small"
                color={flag === f ? 'primary' : 'default'}
                variant={flag === f ? 'filled' : 'outlined'}
                onClick={() => {
                  setFlag(flag === f ? null : f);
                  setPage(0);
                }}
                aria-pressed={flag === f}
              />
            ))}
          </Stack>
        </Stack>
      </CardContent>
      {roster.isFetching && roster.isPlaceholderData && <LinearProgress aria-label="Loading roster" />}
      {roster.isError && <LoadError error={roster.error} onRetry={() => void roster.refetch()} />}
      {roster.data && roster.data.total === 0 && (
        <Typography color="text.secondary" sx={{ px: 2, pb: 2 }}>
          {flag || q ? 'No student culture matches.' : 'No students yet: invite them below or give them the join code.'}
        </Typography>
      )}
      {roster.data && roster.data.total > 0 && (
        <>
          {wide ? (
            <RosterTable
              classId={classId}
              rows={roster.data.items}
              sort={sort}
              order={order}
              onSort={onSort}
              account={account}
              now={now}
            />
          ) : (
            <RosterList classId={classId} rows={roster.data.items} account={account} />
          )}
          <TablePagination
            component="div"
            count={roster.data.total}
            page={page}
            onPageChange={(_, p) => setPage(p)}
            rowsPerPage={rowsPerPage}
            rowsPerPageOptions={[10, 25, 50]}
            onRowsPerPageChange={(e) => {
              setRowsPerPage(Number(e.target.value));
              setPage(0);
            }}
          />
        </>
      )}
    </Card>
  );
}
