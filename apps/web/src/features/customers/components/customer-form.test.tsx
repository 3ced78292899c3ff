import { describe, expect, it, vi } from 'vitest';
import { fireEvent, render, screen, waitFor } from '@testing-library/react';
import { ErrorCode } from '@seamwright/shared';
import { ApiError } from '../../../lib/api-error';
import { CustomerForm } from './customer-form';

function fill(label: string, value: string) {
  fireEvent.change(screen.getByLabelText(label), { target: { value } });
}

describe('CustomerForm', () => {
  it('shows the shared schema’s messages inline as the user types, and does not submit', async () => {
    const onSubmit = vi.fn(() => Promise.resolve());
    render(<CustomerForm submitLabel="Save customer" onSubmit={onSubmit} />);

    fill('E-mail', 'not-an-address');
    expect(await screen.findByText('Enter a valid e-mail address')).toBeTruthy();
    expect(screen.getByLabelText('E-mail').getAttribute('aria-invalid')).toBe('true');

    fill('Phone', 'call me maybe');
    expect(
      await screen.findByText('Enter a phone number using digits, spaces and + ( ) - .'),
    ).toBeTruthy();

    fireEvent.click(screen.getByRole('button', { name: 'Save customer' }));
    expect(await screen.findByText('Name is required')).toBeTruthy();
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it('clears a message once the value is fixed', async () => {
    render(<CustomerForm submitLabel="Save customer" onSubmit={() => Promise.resolve()} />);
    fill('E-mail', 'nope');
    expect(await screen.findByText('Enter a valid e-mail address')).toBeTruthy();
    fill('E-mail', 'ada@example.test');
    await waitFor(() => expect(screen.queryByText('Enter a valid e-mail address')).toBeNull());
  });

  it('puts server field errors beside the fields and keeps what was typed', async () => {
    const onSubmit = vi.fn(() =>
      Promise.reject(
        new ApiError({
          status: 400,
          code: ErrorCode.ValidationFailed,
          title: 'Some fields need attention',
          errors: [{ path: 'name', message: 'A customer with this name already exists' }],
        }),
      ),
    );
    render(<CustomerForm submitLabel="Save customer" onSubmit={onSubmit} />);
    fill('Name', 'Hollow Creek Rentals');
    fill('Phone', '555 0100');
    fireEvent.click(screen.getByRole('button', { name: 'Save customer' }));

    expect(await screen.findByText('A customer with this name already exists')).toBeTruthy();
    expect(onSubmit).toHaveBeenCalledTimes(1);
    expect(screen.getByLabelText<HTMLInputElement>('Name').value).toBe('Hollow Creek Rentals');
    expect(screen.getByLabelText<HTMLInputElement>('Phone').value).toBe('555 0100');
  });

  it('shows a form-level message when the server error has no field', async () => {
    const onSubmit = () =>
      Promise.reject(
        new ApiError({ status: 403, code: ErrorCode.Forbidden, title: 'Your role cannot do this' }),
      );
    render(<CustomerForm submitLabel="Save customer" onSubmit={onSubmit} />);
    fill('Name', 'Juniper Court HOA');
    fireEvent.click(screen.getByRole('button', { name: 'Save customer' }));
    const alerts = await screen.findAllByRole('alert');
    expect(alerts.map((a) => a.textContent)).toContain('Your role cannot do this');
  });
});
