import type { Account, SortOrder } from '@peakwise/shared';
import Box from '@mui/material/Box';
import Link from '@mui/material/Link';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableContainer from '@mui/material/TableContainer';
import TableHead from '@mui/material/TableHead';
import TablePagination from '@mui/material/TablePagination';
import TableRow from '@mui/material/TableRow';
import TableSortLabel from '@mui/material/TableSortLabel';
import Typography from '@mui/material/Typography';
import { useState, type MouseEvent } from 'react';
import { Link as RouterLink, useNavigate } from 'react-router-dom';
import { formatTemperature } from '@peakwise/shared';
import { LoadError } from '@/components/feedback/load-error';
import { formatHeight, formatWeights } from '@/lib/format/units';
import { useFeedings } from '@/lib/logbook/get-feedings';

const when = (iso: string, timeZone: string) =>
  new Date(iso).toLocaleString('en-GB', { timeZone, dateStyle: 'medium', timeStyle: 'short' });

// On a phone the cells pad less, so four columns fit without the amounts breaking at every colon.
const tableSx = { '& .MuiTableCell-root': { px: { xs: 1, sm: 2 } } } as const;

/** "1.06 : 2.12 : 2.12 oz" kept whole, or broken only before its unit when the column is narrow. */
function Amounts({ text }: { text: string }) {
  const cut = text.lastIndexOf(' ');
  return (
    <>
      <Box component="span" sx={{ whiteSpace: 'nowrap' }}>
        {text.slice(0, cut)}
      </Box>{' '}
      {text.slice(cut + 1)}
    </>
  );
}

/** Every feeding of the culture, newest first unless turned around, a page at a time. */
export function FeedingsTable({ cultureId, account }: { cultureId: string; account: Account }) {
  const [order, setOrder] = useState<SortOrder>('desc');
  const [page, setPage] = useState(0);
  const [rowsPerPage, setRowsPerPage] = useState(10);
  const feedings = useFeedings(cultureId, { order, limit: rowsPerPage, offset: page * rowsPerPage });
  const navigate = useNavigate();
  // The whole row is a thumb-sized target; the date stays a real link for keyboards and screen readers.
  const openRow = (id: string) => (event: MouseEvent) => {
    if ((event.target as HTMLElement).closest('a')) return;
    void navigate(`/feedings/${id}`);
  };

  return (
    <Card>
      <CardContent>
        <Typography variant="h2" gutterBottom>
          Feedings
        </Typography>
        {feedings.data && feedings.data.total > 0 && (
          <Typography variant="body2" color="text.secondary" sx={{ mb: 1 }}>
            Open a feeding to correct it, its rise checks or its temperatures.
          </Typography>
        )}
        {feedings.isError && <LoadError error={feedings.error} onRetry={() => void feedings.refetch()} />}
        {feedings.data && feedings.data.total === 0 && <Typography color="text.secondary">No feedings yet.</Typography>}
        {feedings.data && feedings.data.total > 0 && (
          <>
            <TableContainer>
              <Table size="small" aria-label="Feedings" sx={tableSx}>
                <TableHead>
                  <TableRow>
                    <TableCell sortDirection={order}>
                      <TableSortLabel
                        active
                        direction={order}
                        onClick={() => {
                          setOrder(order === 'desc' ? 'asc' : 'desc');
                          setPage(0);
                        }}
                      >
                        Fed at
                      </TableSortLabel>
                    </TableCell>
                    <TableCell align="right">
                      <Box component="span" sx={{ display: { xs: 'none', sm: 'inline' } }}>
                        Starter : flour : water
                      </Box>
                      <Box component="span" sx={{ display: { xs: 'inline', sm: 'none' } }}>
                        Fed with
                      </Box>
                    </TableCell>
                    <TableCell align="right">
                      <Box component="span" sx={{ display: { xs: 'none', sm: 'inline' } }}>
                        Temperature
                      </Box>
                      <Box component="span" sx={{ display: { xs: 'inline', sm: 'none' } }}>
                        Temp.
                      </Box>
                    </TableCell>
                    <TableCell align="right">Start height</TableCell>
                  </TableRow>
                </TableHead>
                <TableBody>
                  {feedings.data.items.map((f) => (
                    <TableRow key={f.id} hover onClick={openRow(f.id)} sx={{ cursor: 'pointer' }}>
                      <TableCell>
                        <Link component={RouterLink} to={`/feedings/${f.id}`} underline="hover">
                          {when(f.fedAt, account.timeZone)}
                        </Link>
                      </TableCell>
                      <TableCell align="right">
                        <Amounts text={formatWeights([f.starterG, f.flourG, f.waterG], account.unitSystem)} />
                      </TableCell>
                      <TableCell align="right" sx={{ whiteSpace: 'nowrap' }}>
                        {f.temperatureC === null ? '—' : formatTemperature(f.temperatureC, account.temperatureUnit, 1)}
                      </TableCell>
                      <TableCell align="right">
                        {f.initialHeightMm === null ? '—' : formatHeight(f.initialHeightMm, account.unitSystem)}
                      </TableCell>
                    </TableRow>
                  ))}
                </TableBody>
              </Table>
            </TableContainer>
            <TablePagination
              component="div"
              count={feedings.data.total}
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
      </CardContent>
    </Card>
  );
}
