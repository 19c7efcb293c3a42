import PrintOutlined from '@mui/icons-material/PrintOutlined';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { LoadError } from '@/components/feedback/load-error';
import { PageLoader } from '@/components/feedback/page-loader';
import { useFormula } from '../api/get-formula';
import { formatFactor, formatGrams, formatPercent } from '../utils/format';

const num = { fontVariantNumeric: 'tabular-nums' } as const;

/**
 * A sheet for the bench: black on white, no navigation, one table a baker can weigh from. Outside
 * the app shell on purpose, so printing gives the formula and nothing else.
 */
export function FormulaPrintPage({ formulaId }: { formulaId: string }) {
  const formula = useFormula(formulaId);
  if (formula.isPending) return <PageLoader />;
  if (formula.isError) return <LoadError error={formula.error} />;
  const f = formula.data;
  const c = f.computed;
  const scaled = c.scaled;

  return (
    <Box sx={{ maxWidth: 720, mx: 'auto', p: { xs: 2, sm: 4 }, bgcolor: '#fff', color: '#000', minHeight: '100vh' }}>
      <title>{`${f.name} · print · Peakwise`}</title>
      <Stack direction="row" spacing={1} sx={{ mb: 2, displayPrint: 'none' }}>
        <Button variant="contained" startIcon={<PrintOutlined />} onClick={() => window.print()}>
          Print
        </Button>
        <Button component={RouterLink} to={`/formulas/${f.id}`}>
          Back to the formula
        </Button>
      </Stack>
      <Typography variant="h1" sx={{ mb: 0.5 }}>
        {f.name}
      </Typography>
      <Typography variant="body2" sx={{ mb: 2 }}>
        Total hydration {formatPercent(c.totalHydrationPercent)} · prefermented flour{' '}
        {formatPercent(c.prefermentedFlourPercent)} · salt {formatPercent(c.saltPercent)} · dough{' '}
        {formatGrams(c.doughWeightG)}
        {scaled ? ` · this batch ${formatFactor(scaled.factor)}: ${formatGrams(scaled.doughWeightG)}` : ''}
      </Typography>
      <Table size="small" aria-label="Formula">
        <TableHead>
          <TableRow>
            <TableCell sx={{ pl: 0 }}>Ingredient</TableCell>
            <TableCell>As typed</TableCell>
            <TableCell align="right">Baker’s %</TableCell>
            <TableCell align="right" sx={{ pr: 0 }}>
              {scaled ? 'Weigh (this batch)' : 'Weigh'}
            </TableCell>
          </TableRow>
        </TableHead>
        <TableBody>
          {c.lines.map((l, i) => (
            <TableRow key={`${l.name}-${i}`}>
              <TableCell sx={{ pl: 0 }}>{l.name}</TableCell>
              <TableCell sx={num}>
                {l.amount} {l.unit}
              </TableCell>
              <TableCell align="right" sx={num}>
                {formatPercent(l.percentOfTotalFlour)}
              </TableCell>
              <TableCell align="right" sx={{ ...num, pr: 0, fontWeight: 500 }}>
                {formatGrams(scaled ? scaled.lines[i]!.roundedG : l.grams)}
              </TableCell>
            </TableRow>
          ))}
          {(scaled ? scaled.blend : c.blend).map((b) => (
            <TableRow key={`blend-${b.name}`}>
              <TableCell sx={{ pl: 2 }} colSpan={2}>
                of the flour: {b.name} ({b.parts} parts)
              </TableCell>
              <TableCell align="right" sx={num}>
                {formatPercent(b.percent)} of blend
              </TableCell>
              <TableCell align="right" sx={{ ...num, pr: 0 }}>
                {formatGrams(b.roundedG)}
              </TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
      <Typography variant="caption" sx={{ display: 'block', mt: 1 }}>
        Baker’s % of all flour, the starter’s included. Weights rounded to {scaled?.roundingRule ?? 'the gram shown'}.
      </Typography>
      {f.notes && (
        <Typography sx={{ mt: 2, whiteSpace: 'pre-wrap' }}>
          <strong>Notes:</strong> {f.notes}
        </Typography>
      )}
      <Box component="ul" sx={{ mt: 2, pl: 2.5 }}>
        {c.cautions.map((caution) => (
          <Typography component="li" variant="body2" key={caution.code}>
            {caution.message}
          </Typography>
        ))}
      </Box>
    </Box>
  );
}
