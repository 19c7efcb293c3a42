import type { CultureState } from '@peakwise/shared';
import Chip from '@mui/material/Chip';

const STATES: Record<CultureState, { label: string; color: 'default' | 'primary' | 'secondary' | 'success' | 'info' }> =
  {
    rising: { label: 'Rising', color: 'primary' },
    ready: { label: 'Ready now', color: 'success' },
    'past-peak': { label: 'Past peak', color: 'secondary' },
    'in-fridge': { label: 'In the fridge', color: 'info' },
    waiting: { label: 'Waiting for rise checks', color: 'default' },
    'not-fed-yet': { label: 'Not fed yet', color: 'default' },
  };

export function stateLabel(state: CultureState): string {
  return STATES[state].label;
}

export function StateChip({ state }: { state: CultureState }) {
  const { label, color } = STATES[state];
  return <Chip label={label} color={color} size="small" sx={{ fontWeight: 500 }} />;
}
