import Visibility from '@mui/icons-material/Visibility';
import VisibilityOff from '@mui/icons-material/VisibilityOff';
import IconButton from '@mui/material/IconButton';
import InputAdornment from '@mui/material/InputAdornment';
import { useState } from 'react';
import type { FieldValues } from 'react-hook-form';
import { FormTextField, type FormTextFieldProps } from './form-text-field';

type PasswordFieldProps<T extends FieldValues> = Omit<FormTextFieldProps<T>, 'type'> & {
  autoComplete: 'current-password' | 'new-password';
};

/** A password input with a show/hide toggle: typing a long passphrase on a phone is error-prone. */
export function PasswordField<T extends FieldValues>(props: PasswordFieldProps<T>) {
  const [visible, setVisible] = useState(false);
  const label = typeof props.label === 'string' ? props.label.toLowerCase() : 'password';
  return (
    <FormTextField
      {...props}
      type={visible ? 'text' : 'password'}
      slotProps={{
        input: {
          endAdornment: (
            <InputAdornment position="end">
              <IconButton
                edge="end"
                aria-label={visible ? `Hide ${label}` : `Show ${label}`}
                onClick={() => setVisible((v) => !v)}
              >
                {visible ? <VisibilityOff /> : <Visibility />}
              </IconButton>
            </InputAdornment>
          ),
        },
      }}
    />
  );
}
