import {
  formatTemperature,
  type Account,
  type Feeding,
  type RiseCheck,
  type RiseCheckListResponse,
} from '@peakwise/shared';
import DeleteOutlined from '@mui/icons-material/DeleteOutlined';
import EditOutlined from '@mui/icons-material/EditOutlined';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import IconButton from '@mui/material/IconButton';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import { useQuery, type UseQueryResult } from '@tanstack/react-query';
import { useState } from 'react';
import { LoadError } from '@/components/feedback/load-error';
import { VisuallyHidden } from '@/components/visually-hidden';
import { formatHeight } from '@/lib/format/units';
import { riseChecksQueryOptions } from '@/lib/logbook/get-rise-checks';
import { useDeleteRiseCheck } from '../api/delete-rise-check';
import { readingTime, risePct } from '../utils/feeding-words';
import { DeleteConfirm } from './delete-confirm';
import { RiseCheckDialog } from './rise-check-dialog';
import { secondary, TakenCell } from './taken-cell';

const riseWords = (pct: number | null) => (pct === null ? '—' : `${pct > 0 ? '+' : ''}${pct} %`);

interface RiseChecksCardProps {
  feeding: Feeding;
  account: Account;
  /** Someone else's feeding shown read-only (an instructor's view): its checks come from there, no edit or delete. */
  readOnly?: { checks: UseQueryResult<RiseCheckListResponse> };
}

/** The feeding's rise checks, oldest first, each to correct or remove. */
export function RiseChecksCard({ feeding, account, readOnly }: RiseChecksCardProps) {
  const own = useQuery({ ...riseChecksQueryOptions(feeding.id), enabled: !readOnly });
  const checks = readOnly?.checks ?? own;
  const remove = useDeleteRiseCheck();
  const [editing, setEditing] = useState<RiseCheck | null>(null);
  const [deleting, setDeleting] = useState<RiseCheck | null>(null);
  const time = (c: RiseCheck) => readingTime(c.takenAt, feeding.fedAt, account.timeZone);
  const rise = (c: RiseCheck) => risePct(c.heightMm, feeding.initialHeightMm);

  return (
    <Card>
      <CardContent>
        <Typography variant="h2" gutterBottom>
          Rise checks
        </Typography>
        {checks.isError && <LoadError error={checks.error} onRetry={() => void checks.refetch()} />}
        {checks.data?.items.length === 0 && (
          <Typography color="text.secondary">No rise checks for this feeding.</Typography>
        )}
        {checks.data && checks.data.items.length > 0 && (
          <Table size="small" aria-label="Rise checks">
            <TableHead>
              <TableRow>
                <TableCell>Taken</TableCell>
                <TableCell align="right">Height</TableCell>
                <TableCell align="right">Rise</TableCell>
                {!readOnly && (
                  <TableCell align="right" sx={{ px: 0 }}>
                    <VisuallyHidden>Edit or delete</VisuallyHidden>
                  </TableCell>
                )}
              </TableRow>
            </TableHead>
            <TableBody>
              {checks.data.items.map((c) => (
                <TableRow key={c.id}>
                  <TakenCell time={time(c)} takenAt={c.takenAt} fedAt={feeding.fedAt} />
                  <TableCell align="right">
                    {formatHeight(c.heightMm, account.unitSystem)}
                    {c.temperatureC !== null && (
                      <Typography component="span" sx={secondary}>
                        {formatTemperature(c.temperatureC, account.temperatureUnit, 1)}
                      </Typography>
                    )}
                  </TableCell>
                  <TableCell align="right">{riseWords(rise(c))}</TableCell>
                  {!readOnly && (
                    <TableCell align="right" sx={{ px: 0, whiteSpace: 'nowrap' }}>
                      <IconButton aria-label={`Edit rise check at ${time(c)}`} onClick={() => setEditing(c)}>
                        <EditOutlined />
                      </IconButton>
                      <IconButton aria-label={`Delete rise check at ${time(c)}`} onClick={() => setDeleting(c)}>
                        <DeleteOutlined />
                      </IconButton>
                    </TableCell>
                  )}
                </TableRow>
              ))}
            </TableBody>
          </Table>
        )}
        {feeding.initialHeightMm === null && checks.data && checks.data.items.length > 0 && (
          <Typography variant="body2" color="text.secondary" sx={{ mt: 1 }}>
            Add the height after feeding to see each check’s rise in %.
          </Typography>
        )}
      </CardContent>
      {editing && (
        <RiseCheckDialog check={editing} feeding={feeding} account={account} onClose={() => setEditing(null)} />
      )}
      <DeleteConfirm
        entry={deleting}
        title="Delete this rise check?"
        confirmLabel="Delete rise check"
        describe={(c) =>
          `The reading at ${time(c)} (${formatHeight(c.heightMm, account.unitSystem)}) goes, and the rise is fitted again without it.`
        }
        remove={(id) => remove.mutateAsync(id)}
        onClose={() => setDeleting(null)}
      />
    </Card>
  );
}
