import type { Control, FieldPath, FieldValues } from 'react-hook-form';
import { emailRules } from '@/lib/validation';
import { FormTextField } from './form-text-field';

/**
 * The e-mail field of sign-in, sign-up and "forgot password": one place for the keyboard hints a
 * phone needs (e-mail keyboard, no capitals, no spell-check) and the shared rules.
 */
export function EmailField<T extends FieldValues>({ control, name }: { control: Control<T>; name: FieldPath<T> }) {
  return (
    <FormTextField
      control={control}
      name={name}
      label="E-mail"
      type="email"
      autoComplete="email"
      rules={emailRules}
      slotProps={{ htmlInput: { inputMode: 'email', autoCapitalize: 'none', spellCheck: false } }}
    />
  );
}
