import Box from '@mui/material/Box';
import Typography from '@mui/material/Typography';
import type { ImportResult } from '@peakwise/shared';

function Count({ label, counts }: { label: string; counts: { new: number; duplicate: number } }) {
  return (
    <Box sx={{ p: 1.5, border: 1, borderColor: 'divider', borderRadius: 1 }}>
      <Typography variant="body2" color="text.secondary">
        {label}
      </Typography>
      <Typography variant="h3" component="p">
        {counts.new} new
      </Typography>
      <Typography variant="body2">{counts.duplicate} already in the logbook</Typography>
    </Box>
  );
}

/** What the checked file would add, and what is already there (those are skipped, never doubled). */
export function CheckCounts({ result }: { result: ImportResult }) {
  return (
    <Box data-testid="import-counts" sx={{ display: 'grid', gap: 1.5, gridTemplateColumns: '1fr 1fr' }}>
      <Count label="Feedings" counts={result.feedings} />
      <Count label="Rise checks" counts={result.riseChecks} />
    </Box>
  );
}
