import InputAdornment from '@mui/material/InputAdornment';

/**
 * slotProps for a number typed as text: its unit after the number (every shown number states its
 * unit) and the phone keypad that fits it, with a decimal point or whole numbers only.
 */
export function unitSlotProps(unit: string, inputMode: 'decimal' | 'numeric' = 'decimal') {
  return {
    input: { endAdornment: <InputAdornment position="end">{unit}</InputAdornment> },
    htmlInput: { inputMode },
  };
}
