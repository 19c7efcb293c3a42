import Box from '@mui/material/Box';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Stack from '@mui/material/Stack';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import type { FormulaComputed } from '@peakwise/shared';
import { formatGrams, formatPercent } from '../utils/format';
import { ChoiceToggle } from './choice-toggle';

export type FormulaViewMode = 'total' | 'final';

const VIEW_CHOICES: { value: FormulaViewMode; label: string }[] = [
  { value: 'total', label: 'Total formula' },
  { value: 'final', label: 'Final dough' },
];

function Figure({ label, value, testId }: { label: string; value: string; testId: string }) {
  return (
    <Box sx={{ minWidth: 0 }}>
      <Typography variant="body2" color="text.secondary">
        {label}
      </Typography>
      <Typography variant="h3" component="p" data-testid={testId} sx={{ fontVariantNumeric: 'tabular-nums' }}>
        {value}
      </Typography>
    </Box>
  );
}

interface FormulaFiguresProps {
  computed: FormulaComputed;
  view: FormulaViewMode;
  onViewChange: (view: FormulaViewMode) => void;
}

/**
 * The formula's key figures and its lines in one of the two conventions: the total formula (the
 * starter opened into its flour and water, every line a % of all flour) or the final dough (the
 * lines as weighed into the mixer, a % of the flour weighed in with them).
 */
export function FormulaFigures({ computed: c, view, onViewChange }: FormulaFiguresProps) {
  const total = view === 'total';
  const rows = total
    ? c.totalFormula.map((l) => ({
        name: l.name,
        // A line wholly from the starter says so in its name ("Flour in Levain"); a mixed one gets a note.
        note:
          l.prefermentedG > 0 && l.prefermentedG < l.grams
            ? `${formatGrams(l.prefermentedG)} of it in the starter`
            : null,
        grams: l.grams,
        percent: l.percentOfTotalFlour,
      }))
    : c.lines.map((l) => ({ name: l.name, note: null, grams: l.grams, percent: l.percentOfFinalDoughFlour }));
  const starterG = c.lines.reduce((s, l) => s + (l.kind === 'starter' ? l.grams : 0), 0);

  return (
    <Card>
      <CardContent>
        <Stack spacing={2}>
          <ChoiceToggle label="Percentages of" value={view} options={VIEW_CHOICES} onChange={onViewChange} />
          <Box sx={{ display: 'grid', gridTemplateColumns: 'repeat(2, minmax(0, 1fr))', gap: 1.5 }}>
            <Figure
              label={total ? 'Total hydration' : 'Final-dough hydration'}
              value={formatPercent(total ? c.totalHydrationPercent : c.finalDoughHydrationPercent)}
              testId="hydration"
            />
            <Figure
              label="Prefermented flour"
              value={formatPercent(c.prefermentedFlourPercent)}
              testId="prefermented"
            />
            <Figure label="Salt" value={formatPercent(total ? c.saltPercent : c.finalDoughSaltPercent)} testId="salt" />
            <Figure label="Dough weight" value={formatGrams(c.doughWeightG)} testId="dough-weight" />
            <Figure
              label={total ? 'All flour (starter’s too)' : 'Flour weighed in'}
              value={formatGrams(total ? c.totalFlourG : c.finalDoughFlourG)}
              testId="flour-weight"
            />
            <Figure
              label={total ? 'All water (milk’s too)' : 'Starter'}
              value={formatGrams(total ? c.totalWaterG : starterG)}
              testId="water-weight"
            />
          </Box>
          <Table size="small" aria-label={total ? 'Total formula' : 'Final dough'}>
            <TableHead>
              <TableRow>
                <TableCell sx={{ pl: 0 }}>{total ? 'Total formula' : 'Into the mixer'}</TableCell>
                <TableCell align="right">Weight</TableCell>
                <TableCell align="right" sx={{ whiteSpace: 'nowrap', pr: 0 }}>
                  Baker’s %
                </TableCell>
              </TableRow>
            </TableHead>
            <TableBody>
              {rows.map((r, i) => (
                <TableRow key={`${r.name}-${i}`}>
                  <TableCell sx={{ pl: 0 }}>
                    {r.name}
                    {r.note && (
                      <Typography variant="caption" color="text.secondary" sx={{ display: 'block' }}>
                        {r.note}
                      </Typography>
                    )}
                  </TableCell>
                  <TableCell align="right" sx={{ fontVariantNumeric: 'tabular-nums' }}>
                    {formatGrams(r.grams)}
                  </TableCell>
                  <TableCell align="right" sx={{ fontVariantNumeric: 'tabular-nums', pr: 0 }}>
                    {formatPercent(r.percent)}
                  </TableCell>
                </TableRow>
              ))}
            </TableBody>
          </Table>
          <Typography variant="body2" color="text.secondary">
            {total
              ? 'Every line as a % of all the flour, the starter’s included; hydration counts the water in the starter, milk, butter and eggs.'
              : 'The lines as you weigh them into the mixer, each as a % of the flour weighed in with them; the starter is one line.'}
          </Typography>
          {[...c.assumptions, ...c.warnings].length > 0 && (
            <Box component="ul" sx={{ m: 0, pl: 2.5, color: 'text.secondary' }} data-testid="assumptions">
              {[...c.assumptions, ...c.warnings].map((a) => (
                <Typography component="li" variant="body2" key={a}>
                  {a}
                </Typography>
              ))}
            </Box>
          )}
        </Stack>
      </CardContent>
    </Card>
  );
}
