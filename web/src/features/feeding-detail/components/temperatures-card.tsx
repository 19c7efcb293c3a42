import { formatTemperature, type Account, type Feeding, type TemperatureReading } from '@peakwise/shared';
import DeleteOutlined from '@mui/icons-material/DeleteOutlined';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import IconButton from '@mui/material/IconButton';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import { LoadError } from '@/components/feedback/load-error';
import { VisuallyHidden } from '@/components/visually-hidden';
import { useDeleteTemperature } from '../api/delete-temperature';
import { useTemperatures } from '../api/get-temperatures';
import { readingTime } from '../utils/feeding-words';
import { DeleteConfirm } from './delete-confirm';
import { TakenCell } from './taken-cell';
import { TemperatureEntryForm } from './temperature-entry-form';

/** The feeding's temperature readings (typed in by hand for now): list, add, remove. */
export function TemperaturesCard({ feeding, account }: { feeding: Feeding; account: Account }) {
  const readings = useTemperatures(feeding.id);
  const remove = useDeleteTemperature();
  const [deleting, setDeleting] = useState<TemperatureReading | null>(null);
  const time = (r: TemperatureReading) => readingTime(r.takenAt, feeding.fedAt, account.timeZone);
  const degrees = (r: TemperatureReading) => formatTemperature(r.temperatureC, account.temperatureUnit, 1);

  return (
    <Card>
      <CardContent>
        <Typography variant="h2" gutterBottom>
          Temperatures
        </Typography>
        <Typography color="text.secondary" sx={{ mb: 2 }}>
          Kitchens warm and cool: Peakwise integrates the rise over these readings instead of assuming one temperature
          for the whole feeding.
        </Typography>
        {readings.isError && <LoadError error={readings.error} onRetry={() => void readings.refetch()} />}
        {readings.data?.items.length === 0 && (
          <Typography color="text.secondary" sx={{ mb: 2 }}>
            No readings yet.
          </Typography>
        )}
        {readings.data && readings.data.items.length > 0 && (
          <Table size="small" aria-label="Temperature readings" sx={{ mb: 2 }}>
            <TableHead>
              <TableRow>
                <TableCell>Taken</TableCell>
                <TableCell align="right">Temperature</TableCell>
                <TableCell align="right" sx={{ px: 0 }}>
                  <VisuallyHidden>Delete</VisuallyHidden>
                </TableCell>
              </TableRow>
            </TableHead>
            <TableBody>
              {readings.data.items.map((r) => (
                <TableRow key={r.id}>
                  <TakenCell time={time(r)} takenAt={r.takenAt} fedAt={feeding.fedAt} />
                  <TableCell align="right">{degrees(r)}</TableCell>
                  <TableCell align="right" sx={{ px: 0 }}>
                    <IconButton aria-label={`Delete reading at ${time(r)}`} onClick={() => setDeleting(r)}>
                      <DeleteOutlined />
                    </IconButton>
                  </TableCell>
                </TableRow>
              ))}
            </TableBody>
          </Table>
        )}
        <TemperatureEntryForm feedingId={feeding.id} account={account} />
        <Button component={RouterLink} to={`/feedings/${feeding.id}/temperatures/import`} sx={{ mt: 1 }}>
          Import logger file
        </Button>
      </CardContent>
      <DeleteConfirm
        entry={deleting}
        title="Delete this reading?"
        confirmLabel="Delete reading"
        describe={(r) => `The ${degrees(r)} reading at ${time(r)} goes.`}
        remove={(id) => remove.mutateAsync(id)}
        onClose={() => setDeleting(null)}
      />
    </Card>
  );
}
