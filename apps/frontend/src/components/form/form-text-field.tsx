import { TextField, type TextFieldProps } from '@mui/material';
import type { ReactNode } from 'react';
import { useController, type Control, type FieldValues, type Path } from 'react-hook-form';

export type FormTextFieldProps<T extends FieldValues, O> = Omit<
  TextFieldProps,
  'name' | 'value' | 'defaultValue' | 'onChange' | 'onBlur' | 'error' | 'helperText'
> & {
  control: Control<T, unknown, O>;
  name: Path<T>;
  /** Shown under the field while it has no error; the error (the client's or the server's) replaces it. */
  helperText?: ReactNode;
  /** Runs after the form has taken the new value (to re-validate a field that depends on it). */
  onValueChange?: (value: string) => void;
};

/**
 * A text field (or a `select` one, with MenuItem children) bound to a react-hook-form field:
 * it shows the field's error in place of its helper text, whether the form's schema or the
 * server (put on the field by name, see `submitWithServerErrors`) found it.
 */
export function FormTextField<T extends FieldValues, O = T>({
  control,
  name,
  helperText,
  onValueChange,
  ...props
}: FormTextFieldProps<T, O>) {
  const { field, fieldState } = useController({ control, name });
  return (
    <TextField
      {...props}
      name={field.name}
      value={field.value ?? ''}
      onChange={(event) => {
        field.onChange(event);
        onValueChange?.(event.target.value);
      }}
      onBlur={field.onBlur}
      inputRef={field.ref}
      disabled={props.disabled ?? field.disabled}
      error={!!fieldState.error}
      helperText={fieldState.error?.message ?? helperText}
    />
  );
}
