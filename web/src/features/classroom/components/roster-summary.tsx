import type { RosterRow } from '@peakwise/shared';
import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Link from '@mui/material/Link';
import { Link as RouterLink } from 'react-router-dom';
import { flagList, rosterSummary } from '../utils/roster-words';

const SHOWN = 5;

/** Above the table: who needs a look, most urgent first, each a link to the culture. */
export function RosterSummary({ classId, rows }: { classId: string; rows: RosterRow[] }) {
  const { headline, lines } = rosterSummary(rows);
  const rest = lines.length - SHOWN;
  return (
    <Alert severity={lines.length > 0 ? 'warning' : 'success'} data-testid="roster-summary">
      <AlertTitle sx={{ mb: lines.length > 0 ? 0.5 : 0 }}>{headline}</AlertTitle>
      {lines.length > 0 && (
        <ul style={{ margin: 0, paddingInlineStart: '1.2em' }}>
          {lines.slice(0, SHOWN).map((line) => (
            <li key={line.key}>
              {line.cultureId ? (
                <Link component={RouterLink} to={`/classes/${classId}/cultures/${line.cultureId}`} color="inherit">
                  {line.name}
                </Link>
              ) : (
                line.name
              )}{' '}
              — {flagList(line.flags)}
            </li>
          ))}
          {rest > 0 && <li>and {rest} more: filter the table by a flag below.</li>}
        </ul>
      )}
    </Alert>
  );
}
