import FormControl from '@mui/material/FormControl';
import FormControlLabel from '@mui/material/FormControlLabel';
import FormHelperText from '@mui/material/FormHelperText';
import FormLabel from '@mui/material/FormLabel';
import Radio from '@mui/material/Radio';
import RadioGroup from '@mui/material/RadioGroup';
import { useId } from 'react';
import { useController, type Control, type FieldPath, type FieldValues } from 'react-hook-form';

interface ChoiceFieldProps<T extends FieldValues> {
  control: Control<T>;
  name: FieldPath<T>;
  label: string;
  options: readonly { value: string; label: string }[];
}

/** A short set of choices as radio buttons: all visible at once, one tap each. */
export function ChoiceField<T extends FieldValues>({ control, name, label, options }: ChoiceFieldProps<T>) {
  const labelId = useId();
  const {
    field: { ref, ...field },
    fieldState,
  } = useController({ control, name });
  return (
    <FormControl error={fieldState.error !== undefined}>
      <FormLabel id={labelId}>{label}</FormLabel>
      <RadioGroup
        row
        aria-labelledby={labelId}
        name={field.name}
        value={field.value}
        onChange={field.onChange}
        onBlur={field.onBlur}
        ref={ref}
      >
        {options.map((option) => (
          <FormControlLabel key={option.value} value={option.value} control={<Radio />} label={option.label} />
        ))}
      </RadioGroup>
      {fieldState.error && <FormHelperText>{fieldState.error.message}</FormHelperText>}
    </FormControl>
  );
}
