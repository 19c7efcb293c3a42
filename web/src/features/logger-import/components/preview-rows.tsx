import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import {
  fahrenheitToCelsius,
  formatTemperature,
  parseLoggerNumber,
  parseLoggerTime,
  type LoggerMapping,
  type TemperatureUnit,
} from '@peakwise/shared';

interface PreviewRowsProps {
  /** Rows after the header, with their line in the file. */
  rows: ReadonlyArray<{ line: number; cells: string[] }>;
  mapping: LoggerMapping;
  /** The baker's zone and unit, in which times and temperatures are shown. */
  timeZone: string;
  unit: TemperatureUnit;
}

const when = (ms: number, timeZone: string) =>
  new Date(ms).toLocaleString('en-GB', { timeZone, dateStyle: 'medium', timeStyle: 'short' });

/** The first rows as Peakwise will read them, so a wrong choice above shows at once. */
export function PreviewRows({ rows, mapping, timeZone, unit }: PreviewRowsProps) {
  return (
    <Table size="small" aria-label="The first rows as they will be read" data-testid="logger-preview">
      <TableHead>
        <TableRow>
          <TableCell>Line</TableCell>
          <TableCell>Time ({timeZone})</TableCell>
          <TableCell align="right">Temperature</TableCell>
        </TableRow>
      </TableHead>
      <TableBody>
        {rows.map(({ line, cells }) => {
          const ms = parseLoggerTime(cells[mapping.timeColumn] ?? '', mapping.dateFormat, mapping.timeZone);
          const value = parseLoggerNumber(cells[mapping.temperatureColumn] ?? '');
          const c = value === null ? null : mapping.unit === 'F' ? fahrenheitToCelsius(value) : value;
          const unread = (cell: string | undefined) => (
            <Typography component="span" color="error" variant="body2">
              {cell?.trim() ? `“${cell}” not read` : 'empty, not read'}
            </Typography>
          );
          return (
            <TableRow key={line}>
              <TableCell>{line}</TableCell>
              <TableCell>{ms === null ? unread(cells[mapping.timeColumn]) : when(ms, timeZone)}</TableCell>
              <TableCell align="right">
                {c === null ? unread(cells[mapping.temperatureColumn]) : formatTemperature(c, unit, 1)}
              </TableCell>
            </TableRow>
          );
        })}
      </TableBody>
    </Table>
  );
}
