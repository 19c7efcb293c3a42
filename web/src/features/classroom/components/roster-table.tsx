import type { Account, RosterRow, RosterSort, SortOrder } from '@peakwise/shared';
import TrendingDown from '@mui/icons-material/TrendingDown';
import TrendingFlat from '@mui/icons-material/TrendingFlat';
import TrendingUp from '@mui/icons-material/TrendingUp';
import Box from '@mui/material/Box';
import Link from '@mui/material/Link';
import Stack from '@mui/material/Stack';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableContainer from '@mui/material/TableContainer';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import TableSortLabel from '@mui/material/TableSortLabel';
import Typography from '@mui/material/Typography';
import { formatTemperature, REFERENCE_TEMPERATURE_C } from '@peakwise/shared';
import type { MouseEvent, ReactNode } from 'react';
import { Link as RouterLink, useNavigate } from 'react-router-dom';
import { formatClock, formatDuration } from '@/lib/format/duration';
import { hoursText, riseText, sortedFlags, trendWords } from '../utils/roster-words';
import { FlagChip } from './flag-chip';

interface RosterTableProps {
  classId: string;
  rows: RosterRow[];
  sort: RosterSort;
  order: SortOrder;
  onSort: (sort: RosterSort) => void;
  account: Account;
  now: Date;
}

// A culture that turns slower is losing vigour: down, in the warning colour; faster is good news.
const TREND_ICON = {
  slower: <TrendingDown fontSize="small" color="warning" aria-hidden />,
  faster: <TrendingUp fontSize="small" color="success" aria-hidden />,
  steady: <TrendingFlat fontSize="small" color="action" aria-hidden />,
} as const;

const tableSx = { '& .MuiTableCell-root': { px: { xs: 1, sm: 2 } } } as const;

/** One row per student culture; the row opens the culture, read-only. */
export function RosterTable({ classId, rows, sort, order, onSort, account, now }: RosterTableProps) {
  const navigate = useNavigate();
  const reference = `${formatTemperature(REFERENCE_TEMPERATURE_C, account.temperatureUnit)}, 1:1:1`;
  const header = (key: RosterSort | null, label: ReactNode, align: 'left' | 'right' = 'left') => (
    <TableCell align={align} sortDirection={key !== null && sort === key ? order : false}>
      {key === null ? (
        label
      ) : (
        <TableSortLabel active={sort === key} direction={sort === key ? order : 'asc'} onClick={() => onSort(key)}>
          {label}
        </TableSortLabel>
      )}
    </TableCell>
  );
  const cultureHref = (row: RosterRow) => (row.cultureId ? `/classes/${classId}/cultures/${row.cultureId}` : null);
  // The whole row is a thumb-sized target; the name stays a real link for keyboards and screen readers.
  const openRow = (row: RosterRow) => (event: MouseEvent) => {
    const href = cultureHref(row);
    if (!href || (event.target as HTMLElement).closest('a, button, [role="button"]')) return;
    void navigate(href);
  };

  return (
    <TableContainer>
      <Table size="small" aria-label="Roster" sx={tableSx}>
        <TableHead>
          <TableRow>
            {header('student', 'Student · culture')}
            {header('flags', 'Flags')}
            {header('lastFed', 'Last fed')}
            {header(
              'hoursToPeak',
              <span>
                Time to peak
                <Box component="span" sx={{ display: 'block', fontWeight: 400, fontSize: '0.75rem' }}>
                  at {reference}
                </Box>
              </span>,
              'right',
            )}
            {header('riseMultiple', 'Rise', 'right')}
            {header(null, 'Trend')}
          </TableRow>
        </TableHead>
        <TableBody>
          {rows.map((row) => {
            const href = cultureHref(row);
            return (
              <TableRow
                key={`${row.studentId}:${row.cultureId ?? ''}`}
                hover={href !== null}
                onClick={openRow(row)}
                sx={{ cursor: href ? 'pointer' : 'default' }}
              >
                <TableCell>
                  <Typography sx={{ fontWeight: 500 }}>{row.studentName}</Typography>
                  {href ? (
                    <Link component={RouterLink} to={href} underline="hover" variant="body2">
                      {row.cultureName}
                    </Link>
                  ) : (
                    <Typography variant="body2" color="text.secondary">
                      No culture yet
                    </Typography>
                  )}
                </TableCell>
                <TableCell>
                  <Stack direction="row" sx={{ flexWrap: 'wrap', gap: 0.5 }}>
                    {sortedFlags(row.flags).map((flag) => (
                      <FlagChip key={flag} flag={flag} />
                    ))}
                    {row.flags.length === 0 && (
                      <Typography variant="body2" color="text.secondary">
                        None
                      </Typography>
                    )}
                  </Stack>
                </TableCell>
                <TableCell sx={{ whiteSpace: 'nowrap' }}>
                  {row.lastFedAt ? (
                    <>
                      {formatClock(row.lastFedAt, account.timeZone, now)}
                      {row.hoursSinceFed !== null && (
                        <Typography variant="body2" color="text.secondary">
                          {formatDuration(row.hoursSinceFed)} ago
                        </Typography>
                      )}
                    </>
                  ) : (
                    '—'
                  )}
                </TableCell>
                <TableCell align="right" sx={{ whiteSpace: 'nowrap' }}>
                  {hoursText(row.hoursToPeakAtReference)}
                </TableCell>
                <TableCell align="right" sx={{ whiteSpace: 'nowrap' }}>
                  {riseText(row.riseMultiple)}
                </TableCell>
                <TableCell>
                  <Stack direction="row" spacing={0.5} sx={{ alignItems: 'center' }}>
                    {row.trend && TREND_ICON[row.trend]}
                    <span>{trendWords(row.trend)}</span>
                  </Stack>
                </TableCell>
              </TableRow>
            );
          })}
        </TableBody>
      </Table>
    </TableContainer>
  );
}
