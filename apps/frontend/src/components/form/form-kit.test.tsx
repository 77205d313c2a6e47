import { zodResolver } from '@hookform/resolvers/zod';
import { Button, MenuItem } from '@mui/material';
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { FormTextField } from '@/components/form/form-text-field';
import { ServerErrorAlert, submitWithServerErrors } from '@/components/form/server-errors';
import { ApiError } from '@/lib/api-client';

const schema = z.object({
  code: z.string().trim().min(1, 'Enter a code.'),
  status: z.enum(['approved', 'suspended']),
});
type Input = z.infer<typeof schema>;
const FIELDS = ['code', 'status'] as const;

const refusal = new ApiError(
  409,
  {
    statusCode: 409,
    error: 'Conflict',
    message: ['code is taken', 'The catalog is read-only today.'],
    errors: [
      { field: 'code', message: 'A supplier with this code exists.' },
      { field: null, message: 'The catalog is read-only today.' },
    ],
    path: '/api/suppliers',
    requestId: 'r1',
  },
  '',
);

/** A small form of the kind the screens build: what the server said goes where it belongs. */
function Probe({ onSave }: { onSave: (input: Input) => Promise<void> }) {
  const [error, setError] = useState<unknown>(null);
  const form = useForm<Input>({
    resolver: zodResolver(schema),
    mode: 'onChange',
    defaultValues: { code: '', status: 'approved' },
  });
  const onSubmit = submitWithServerErrors(form, FIELDS, async (input) => {
    setError(null);
    try {
      await onSave(input);
    } catch (e) {
      setError(e);
      throw e;
    }
  });
  return (
    <form noValidate onSubmit={onSubmit} aria-label="Probe">
      <ServerErrorAlert error={error} fields={FIELDS} />
      <FormTextField control={form.control} name="code" label="Code" helperText="Short." />
      <FormTextField control={form.control} name="status" label="Status" select>
        <MenuItem value="approved">Approved</MenuItem>
        <MenuItem value="suspended">Suspended</MenuItem>
      </FormTextField>
      <Button type="submit">Save</Button>
    </form>
  );
}

describe('form kit', () => {
  it('shows the helper text, then the schema error in its place, then the value typed', async () => {
    const saved: Input[] = [];
    render(<Probe onSave={async (input) => void saved.push(input)} />);
    const code = screen.getByRole('textbox', { name: 'Code' });
    expect(screen.getByText('Short.')).toBeInTheDocument();
    await userEvent.click(screen.getByRole('button', { name: 'Save' }));
    expect(await screen.findByText('Enter a code.')).toBeInTheDocument();
    expect(code).toHaveAttribute('aria-invalid', 'true');
    expect(saved).toEqual([]);
    await userEvent.type(code, 'NV');
    expect(screen.getByText('Short.')).toBeInTheDocument();
    await userEvent.click(screen.getByRole('button', { name: 'Save' }));
    expect(saved).toEqual([{ code: 'NV', status: 'approved' }]);
  });

  it("puts the server's field message on its field and the rest above the form", async () => {
    render(<Probe onSave={() => Promise.reject(refusal)} />);
    await userEvent.type(screen.getByRole('textbox', { name: 'Code' }), 'NV');
    await userEvent.click(screen.getByRole('button', { name: 'Save' }));
    expect(await screen.findByText('A supplier with this code exists.')).toBeInTheDocument();
    expect(screen.getByRole('textbox', { name: 'Code' })).toHaveAttribute('aria-invalid', 'true');
    expect(screen.getByRole('alert')).toHaveTextContent('The catalog is read-only today.');
    expect(screen.getByRole('alert')).not.toHaveTextContent('A supplier with this code exists.');
    expect(screen.queryByText('Short.')).not.toBeInTheDocument();
  });
});
