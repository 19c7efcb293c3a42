import TableCell from '@mui/material/TableCell';
import Typography from '@mui/material/Typography';
import { formatDuration } from '@/lib/format/duration';
import { hoursAfter } from '../utils/feeding-words';

export const secondary = { display: 'block', color: 'text.secondary', fontSize: '0.8rem' } as const;

/** When a reading was taken: its clock time, and below it how long after the feeding. */
export function TakenCell({ time, takenAt, fedAt }: { time: string; takenAt: string; fedAt: string }) {
  return (
    <TableCell>
      {time}
      <Typography component="span" sx={secondary}>
        +{formatDuration(hoursAfter(fedAt, takenAt))}
      </Typography>
    </TableCell>
  );
}
