import ToggleButton from '@mui/material/ToggleButton';
import ToggleButtonGroup from '@mui/material/ToggleButtonGroup';
import { RATIO_PRESETS, type RatioChoice } from '@/lib/logbook/feeding-form';
import { bigToggleSx } from '@/components/logbook/toggle-sx';

/** Big preset buttons: starter : flour : water. */
export function RatioField({ value, onChange }: { value: RatioChoice; onChange: (v: RatioChoice) => void }) {
  return (
    <ToggleButtonGroup
      exclusive
      fullWidth
      color="primary"
      aria-label="Ratio starter : flour : water"
      value={value}
      onChange={(_, v: RatioChoice | null) => v && onChange(v)}
    >
      {[...RATIO_PRESETS, 'custom' as const].map((r) => (
        <ToggleButton key={r} value={r} sx={bigToggleSx}>
          {r === 'custom' ? 'Custom' : r}
        </ToggleButton>
      ))}
    </ToggleButtonGroup>
  );
}
