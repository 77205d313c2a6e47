import { MenuItem, TextField } from '@mui/material';
import { Controller, type Control, type FieldValues, type Path } from 'react-hook-form';
import { ROLES, roleLabels } from '@/lib/roles';

/** Menu items for a role select; MUI's Select wants them as direct children. */
export const roleOptions = ROLES.map((role) => (
  <MenuItem key={role} value={role}>
    {roleLabels[role]}
  </MenuItem>
));

/** The Role select of the user forms, bound to the form's `role` field. */
export function RoleField<T extends FieldValues & { role: string }>({
  control,
}: {
  control: Control<T>;
}) {
  return (
    <Controller
      control={control}
      name={'role' as Path<T>}
      render={({ field, fieldState }) => (
        <TextField
          select
          label="Role"
          {...field}
          error={!!fieldState.error}
          helperText={fieldState.error?.message}
        >
          {roleOptions}
        </TextField>
      )}
    />
  );
}
