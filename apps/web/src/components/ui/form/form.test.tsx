import { describe, expect, it, vi } from 'vitest';
import { fireEvent, render, screen, waitFor } from '@testing-library/react';
import { z } from 'zod';
import { ErrorCode } from '@seamwright/shared';
import { ApiError } from '../../../lib/api-error';
import { testSession, WithSession } from '../../../test/session-fixture';
import { Form, LengthField, SelectField, SubmitButton, TextAreaField, TextField } from './index';

const schema = z.object({
  name: z.string().trim().min(1, 'Name is required'),
  notes: z.string().max(5, 'Keep it short'),
  kind: z.enum(['a', 'b']),
});

function KitForm({
  onSubmit,
}: {
  onSubmit: (values: z.output<typeof schema>) => Promise<unknown>;
}) {
  return (
    <Form
      schema={schema}
      defaultValues={{ name: '', notes: '', kind: 'a' }}
      onSubmit={onSubmit}
      aria-label="Test form"
    >
      <TextField name="name" label="Name" hint="As it prints" />
      <TextAreaField name="notes" label="Notes" />
      <SelectField name="kind" label="Kind">
        <option value="a">A</option>
        <option value="b">B</option>
      </SelectField>
      <SubmitButton busyLabel="Saving…">Save</SubmitButton>
    </Form>
  );
}

const describedText = (element: HTMLElement) =>
  document.getElementById(element.getAttribute('aria-describedby') ?? '')?.textContent;

describe('form kit', () => {
  it('labels each field and points aria-describedby at its hint', () => {
    render(<KitForm onSubmit={() => Promise.resolve()} />);
    const name = screen.getByLabelText('Name');
    expect(describedText(name)).toBe('As it prints');
    expect(name.getAttribute('aria-invalid')).toBeNull();
    expect(screen.getByLabelText('Notes').tagName).toBe('TEXTAREA');
    expect(screen.getByLabelText('Kind').tagName).toBe('SELECT');
    expect(screen.getByRole('form', { name: 'Test form' })).toBeTruthy();
  });

  it('shows the schema’s message under the field as you type, described and marked invalid', async () => {
    render(<KitForm onSubmit={() => Promise.resolve()} />);
    const notes = screen.getByLabelText('Notes');
    fireEvent.change(notes, { target: { value: 'far too long' } });
    expect(await screen.findByText('Keep it short')).toBeTruthy();
    expect(notes.getAttribute('aria-invalid')).toBe('true');
    expect(describedText(notes)).toBe('Keep it short');
  });

  it('submits the parsed values and does not submit invalid ones', async () => {
    const onSubmit = vi.fn((_values: z.output<typeof schema>) => Promise.resolve());
    render(<KitForm onSubmit={onSubmit} />);
    fireEvent.click(screen.getByRole('button', { name: 'Save' }));
    expect(await screen.findByText('Name is required')).toBeTruthy();
    expect(onSubmit).not.toHaveBeenCalled();
    fireEvent.change(screen.getByLabelText('Name'), { target: { value: '  Ada  ' } });
    fireEvent.change(screen.getByLabelText('Kind'), { target: { value: 'b' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save' }));
    await waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    expect(onSubmit.mock.calls[0]?.[0]).toEqual({ name: 'Ada', notes: '', kind: 'b' });
  });

  it('puts a server field error beside its field and keeps what was typed', async () => {
    const onSubmit = () =>
      Promise.reject(
        new ApiError({
          status: 400,
          code: ErrorCode.ValidationFailed,
          title: 'Some fields need attention',
          errors: [{ path: 'name', message: 'That name is taken' }],
        }),
      );
    render(<KitForm onSubmit={onSubmit} />);
    const name = screen.getByLabelText<HTMLInputElement>('Name');
    fireEvent.change(name, { target: { value: 'Ada' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save' }));
    expect(await screen.findByText('That name is taken')).toBeTruthy();
    expect(describedText(name)).toBe('That name is taken');
    expect(name.getAttribute('aria-invalid')).toBe('true');
    expect(name.value).toBe('Ada');
    // Every message found its field, so nothing is repeated at the top.
    expect(screen.getAllByRole('alert').map((a) => a.textContent)).toEqual(['That name is taken']);
  });

  it('puts a server error for a field the form does not show at the top', async () => {
    const onSubmit = () =>
      Promise.reject(
        new ApiError({
          status: 400,
          code: ErrorCode.ValidationFailed,
          title: 'Some fields need attention',
          detail: 'slug: Already used',
          errors: [{ path: 'slug', message: 'Already used' }],
        }),
      );
    render(<KitForm onSubmit={onSubmit} />);
    fireEvent.change(screen.getByLabelText('Name'), { target: { value: 'Ada' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save' }));
    const alerts = await screen.findAllByRole('alert');
    expect(alerts.map((a) => a.textContent)).toEqual(['slug: Already used']);
  });

  it('shows the busy label while the submit runs', async () => {
    let finish: () => void = () => undefined;
    render(<KitForm onSubmit={() => new Promise<void>((resolve) => (finish = resolve))} />);
    fireEvent.change(screen.getByLabelText('Name'), { target: { value: 'Ada' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save' }));
    const busy = await screen.findByRole('button', { name: 'Saving…' });
    expect(busy.getAttribute('aria-busy')).toBe('true');
    finish();
    expect(await screen.findByRole('button', { name: 'Save' })).toBeTruthy();
  });
});

const lengthSchema = z.object({
  width: z.number({ error: 'Give the width' }).positive('Give the width'),
});

function LengthForm({ onSubmit }: { onSubmit: (values: { width: number }) => void }) {
  return (
    <Form schema={lengthSchema} defaultValues={{ width: 20.5 }} onSubmit={onSubmit}>
      <LengthField name="width" label="Width" />
      <SubmitButton>Save</SubmitButton>
    </Form>
  );
}

describe('LengthField', () => {
  it('shows feet and inches, reads what the trade types and hands the form feet', async () => {
    const onSubmit = vi.fn();
    render(<LengthForm onSubmit={onSubmit} />);
    const width = screen.getByLabelText<HTMLInputElement>('Width');
    expect(width.value).toBe(`20' 6"`);
    expect(describedText(width)).toBe(`Such as 27' 6", 27 ft 6 in or 27.5`);
    fireEvent.change(width, { target: { value: '27 ft 3 in' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save' }));
    await waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    expect(onSubmit.mock.calls[0]?.[0]).toEqual({ width: 27.25 });
    expect(width.value).toBe('27 ft 3 in');
  });

  it('shows the parser’s message as you type and blocks the submit', async () => {
    const onSubmit = vi.fn();
    render(<LengthForm onSubmit={onSubmit} />);
    const width = screen.getByLabelText('Width');
    fireEvent.change(width, { target: { value: `20' 14"` } });
    expect(screen.getByText(/^Inches must be less than 12/)).toBeTruthy();
    expect(width.getAttribute('aria-invalid')).toBe('true');
    fireEvent.click(screen.getByRole('button', { name: 'Save' }));
    await waitFor(() => expect(width.getAttribute('aria-invalid')).toBe('true'));
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it('shows and reads metres for a metric company', async () => {
    const onSubmit = vi.fn();
    render(
      <WithSession me={testSession({ measurementSystem: 'metric' })}>
        <LengthForm onSubmit={onSubmit} />
      </WithSession>,
    );
    const width = screen.getByLabelText<HTMLInputElement>('Width');
    expect(width.value).toBe('6.25 m'); // 20.5 × 0.3048 = 6.2484
    fireEvent.change(width, { target: { value: '3' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save' }));
    await waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    // A bare number is metres for a metric company: 3 m ÷ 0.3048 m/ft (exact, 1959 agreement).
    const { width: feet } = (onSubmit.mock.calls[0] as [{ width: number }])[0];
    expect(feet).toBeCloseTo(3 / 0.3048, 10);
  });
});
