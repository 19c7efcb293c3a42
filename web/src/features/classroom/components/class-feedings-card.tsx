import type { Account } from '@peakwise/shared';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Link from '@mui/material/Link';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableContainer from '@mui/material/TableContainer';
import TableHead from '@mui/material/TableHead';
import TablePagination from '@mui/material/TablePagination';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import { formatTemperature } from '@peakwise/shared';
import { useState, type MouseEvent } from 'react';
import { Link as RouterLink, useNavigate } from 'react-router-dom';
import { LoadError } from '@/components/feedback/load-error';
import { formatHeight, formatWeights } from '@/lib/format/units';
import { useClassFeedings } from '../api/get-class-feedings';

const when = (iso: string, timeZone: string) =>
  new Date(iso).toLocaleString('en-GB', { timeZone, dateStyle: 'medium', timeStyle: 'short' });

const tableSx = { '& .MuiTableCell-root': { px: { xs: 1, sm: 2 } } } as const;

/** The student's feedings, newest first, each opening its read-only page (where comments go). */
export function ClassFeedingsCard({
  classId,
  cultureId,
  account,
}: {
  classId: string;
  cultureId: string;
  account: Account;
}) {
  const [page, setPage] = useState(0);
  const [rowsPerPage, setRowsPerPage] = useState(10);
  const feedings = useClassFeedings(classId, cultureId, {
    order: 'desc',
    limit: rowsPerPage,
    offset: page * rowsPerPage,
  });
  const navigate = useNavigate();
  const href = (id: string) => `/classes/${classId}/feedings/${id}`;
  const openRow = (id: string) => (event: MouseEvent) => {
    if ((event.target as HTMLElement).closest('a')) return;
    void navigate(href(id));
  };

  return (
    <Card>
      <CardContent>
        <Typography variant="h2" gutterBottom>
          Feedings
        </Typography>
        {feedings.data && feedings.data.total > 0 && (
          <Typography variant="body2" color="text.secondary" sx={{ mb: 1 }}>
            Open a feeding to see its rise checks and leave a comment.
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
                    <TableCell>Fed at</TableCell>
                    <TableCell align="right">Starter : flour : water</TableCell>
                    <TableCell align="right">Temp.</TableCell>
                    <TableCell align="right">Start height</TableCell>
                  </TableRow>
                </TableHead>
                <TableBody>
                  {feedings.data.items.map((f) => (
                    <TableRow key={f.id} hover onClick={openRow(f.id)} sx={{ cursor: 'pointer' }}>
                      <TableCell>
                        <Link component={RouterLink} to={href(f.id)} underline="hover">
                          {when(f.fedAt, account.timeZone)}
                        </Link>
                      </TableCell>
                      <TableCell align="right">
                        {formatWeights([f.starterG, f.flourG, f.waterG], account.unitSystem)}
                      </TableCell>
                      <TableCell align="right" sx={{ whiteSpace: 'nowrap' }}>
                        {f.temperatureC === null ? '—' : formatTemperature(f.temperatureC, account.temperatureUnit, 1)}
                      </TableCell>
                      <TableCell align="right" sx={{ whiteSpace: 'nowrap' }}>
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
