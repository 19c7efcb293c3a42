import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableContainer from '@mui/material/TableContainer';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import { CSV_COLUMNS, type CsvRow } from '@peakwise/shared';
import { COLUMN_INFO } from '../utils/columns';
import type { ColumnMapping } from '../utils/csv-header';

/** The first rows as Peakwise read them, by our columns, so a wrong match shows before importing. */
export function PreviewTable({ rows, mapping }: { rows: readonly CsvRow[]; mapping: ColumnMapping }) {
  const columns = CSV_COLUMNS.filter((c) => mapping[c] !== '');
  if (rows.length === 0) return null;
  return (
    <>
      <Typography variant="h3" component="h3">
        {rows.length === 1 ? 'The first row' : `The first ${rows.length} rows`}, as read
      </Typography>
      {/* Wide by nature: it scrolls sideways inside the card instead of widening the page. */}
      <TableContainer sx={{ overflowX: 'auto', border: 1, borderColor: 'divider', borderRadius: 1 }}>
        <Table size="small" aria-label="Preview of the file">
          <TableHead>
            <TableRow>
              {columns.map((c) => (
                <TableCell key={c} sx={{ whiteSpace: 'nowrap', fontWeight: 500 }}>
                  {COLUMN_INFO[c].short}
                </TableCell>
              ))}
            </TableRow>
          </TableHead>
          <TableBody>
            {rows.map((row, i) => (
              <TableRow key={i}>
                {columns.map((c) => (
                  <TableCell
                    key={c}
                    title={row[c]}
                    sx={{ whiteSpace: 'nowrap', maxWidth: 220, overflow: 'hidden', textOverflow: 'ellipsis' }}
                  >
                    {row[c] === '' ? '—' : row[c]}
                  </TableCell>
                ))}
              </TableRow>
            ))}
          </TableBody>
        </Table>
      </TableContainer>
    </>
  );
}
