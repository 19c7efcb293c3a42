import TextField, { type TextFieldProps } from '@mui/material/TextField';
import { useController, type Control, type FieldPath, type FieldValues, type RegisterOptions } from 'react-hook-form';

export type FormTextFieldProps<T extends FieldValues> = Omit<
  TextFieldProps,
  'name' | 'value' | 'onChange' | 'onBlur' | 'error' | 'defaultValue'
> & {
  control: Control<T>;
  name: FieldPath<T>;
  rules?: RegisterOptions<T, FieldPath<T>>;
};

/**
 * A MUI text field bound to react-hook-form. The input's `name` is the form field's name, so
 * browsers, password managers and tests see the same names the API uses.
 */
export function FormTextField<T extends FieldValues>({
  control,
  name,
  rules,
  helperText,
  ...props
}: FormTextFieldProps<T>) {
  const { field, fieldState } = useController({ control, name, rules });
  return (
    <TextField
      {...props}
      name={field.name}
      value={field.value ?? ''}
      onChange={field.onChange}
      onBlur={field.onBlur}
      inputRef={field.ref}
      error={fieldState.error !== undefined}
      helperText={fieldState.error?.message ?? helperText}
    />
  );
}
