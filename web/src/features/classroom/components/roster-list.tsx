import type { Account, RosterRow } from '@peakwise/shared';
import Box from '@mui/material/Box';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import ListItemButton from '@mui/material/ListItemButton';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { formatTemperature, REFERENCE_TEMPERATURE_C } from '@peakwise/shared';
import { Link as RouterLink } from 'react-router-dom';
import { formatDuration } from '@/lib/format/duration';
import { hoursText, riseText, sortedFlags, trendWords } from '../utils/roster-words';
import { FlagChip } from './flag-chip';

/** The roster on a phone: one tappable entry per student culture, flags in sight without scrolling sideways. */
export function RosterList({ classId, rows, account }: { classId: string; rows: RosterRow[]; account: Account }) {
  const reference = formatTemperature(REFERENCE_TEMPERATURE_C, account.temperatureUnit);
  return (
    <List aria-label="Roster" disablePadding>
      {rows.map((row) => {
        const facts = row.cultureId
          ? [
              row.hoursSinceFed === null ? 'not fed yet' : `fed ${formatDuration(row.hoursSinceFed)} ago`,
              `peak ${hoursText(row.hoursToPeakAtReference)} at ${reference}`,
              `rise ${riseText(row.riseMultiple)}`,
              row.trend ? trendWords(row.trend).toLowerCase() : null,
            ]
              .filter(Boolean)
              .join(' · ')
          : null;
        const content = (
          <Box sx={{ width: '100%' }}>
            <Typography sx={{ fontWeight: 500 }}>
              {row.studentName}
              {row.cultureName && (
                <Box component="span" sx={{ fontWeight: 400, color: 'text.secondary' }}>
                  {' '}
                  · {row.cultureName}
                </Box>
              )}
            </Typography>
            {row.flags.length > 0 && (
              <Stack direction="row" sx={{ flexWrap: 'wrap', gap: 0.5, my: 0.5 }}>
                {sortedFlags(row.flags).map((flag) => (
                  <FlagChip key={flag} flag={flag} />
                ))}
              </Stack>
            )}
            {facts && (
              <Typography variant="body2" color="text.secondary">
                {facts}
              </Typography>
            )}
          </Box>
        );
        const key = `${row.studentId}:${row.cultureId ?? ''}`;
        return row.cultureId ? (
          <ListItemButton key={key} component={RouterLink} to={`/classes/${classId}/cultures/${row.cultureId}`} divider>
            {content}
          </ListItemButton>
        ) : (
          <ListItem key={key} divider>
            {content}
          </ListItem>
        );
      })}
    </List>
  );
}
