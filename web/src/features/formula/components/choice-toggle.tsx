import ToggleButton from '@mui/material/ToggleButton';
import ToggleButtonGroup from '@mui/material/ToggleButtonGroup';
import { filledToggleSx } from '../utils/toggle-sx';

interface ChoiceToggleProps<T extends string> {
  /** Names the group for screen readers. */
  label: string;
  value: T;
  options: readonly { value: T; label: string }[];
  onChange: (value: T) => void;
}

/**
 * One of a few choices as a full-width row of filled buttons. Tapping the chosen one again keeps
 * it: there is always a choice, so the group never answers "none".
 */
export function ChoiceToggle<T extends string>({ label, value, options, onChange }: ChoiceToggleProps<T>) {
  return (
    <ToggleButtonGroup
      exclusive
      sx={filledToggleSx}
      fullWidth
      size="small"
      color="primary"
      aria-label={label}
      value={value}
      onChange={(_, v: T | null) => v && onChange(v)}
    >
      {options.map((o) => (
        <ToggleButton key={o.value} value={o.value}>
          {o.label}
        </ToggleButton>
      ))}
    </ToggleButtonGroup>
  );
}
