import { describe, expect, it } from 'vitest';
import { fireEvent, render, screen } from '@testing-library/react';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { testSession, WithSession } from '../../../test/session-fixture';
import type { TurfProductChoice } from '../api/get-turf-products';
import { sampleArea } from '../test/sample-area';
import { AreaForm } from './area-form';

const products: TurfProductChoice[] = [
  { id: 'p-landscape', name: 'Landscape turf', rollWidthsFt: [15, 12], maxRollLengthFt: 100 },
  { id: 'p-pet', name: 'Pet turf', rollWidthsFt: [12], maxRollLengthFt: 100 },
];

function renderForm(props: { drawingProblem?: string | null; isSaved?: boolean } = {}) {
  render(
    <QueryClientProvider client={new QueryClient()}>
      <WithSession me={testSession()}>
        <AreaForm
          jobId="00000000-0000-4000-8000-00000000b001"
          area={props.isSaved ? sampleArea() : null}
          products={products}
          drawingProblem={props.drawingProblem ?? null}
          getDrawing={() => ({ area: { outer: [], holes: [] } })}
          onSaved={() => undefined}
          onCancel={() => undefined}
        />
      </WithSession>
    </QueryClientProvider>,
  );
}

const widths = () =>
  Array.from(screen.getByLabelText<HTMLSelectElement>('Roll width').options).map((o) => o.text);

describe('AreaForm', () => {
  it('offers the chosen product’s roll widths and follows a change of product', () => {
    // (The selects' starting values are checked in the browser, tests/e2e/job-areas.spec.ts:
    // happy-dom does not show react-hook-form's default on an uncontrolled select.)
    renderForm();
    expect(widths()).toEqual([`15' 0"`, `12' 0"`]);
    fireEvent.change(screen.getByLabelText('Turf product'), { target: { value: 'p-pet' } });
    expect(widths()).toEqual([`12' 0"`]);
    // No product: the common widths (TRADE.md §1: 15 ft, also 12 ft).
    fireEvent.change(screen.getByLabelText('Turf product'), { target: { value: '' } });
    expect(widths()).toEqual([`15' 0"`, `12' 0"`]);
  });

  it('shows the fields of the grain choice picked, each labelled', () => {
    renderForm();
    expect(screen.getByRole('radio', { name: /buys the least turf/ })).toHaveProperty(
      'checked',
      true,
    );
    expect(screen.queryByLabelText('Blades lean toward')).toBeNull();
    fireEvent.click(screen.getByRole('radio', { name: /Blades lean toward a side/ }));
    expect(screen.getByLabelText('Blades lean toward')).toBeTruthy();
    expect(screen.getByLabelText('That side is')).toBeTruthy();
    fireEvent.click(screen.getByRole('radio', { name: /A direction I choose/ }));
    expect(screen.getByLabelText('Grain direction (°)')).toBeTruthy();
    expect(screen.queryByLabelText('That side is')).toBeNull();
  });

  it('says what stops the save when the drawing is not finished, and keeps what was typed', async () => {
    renderForm({ drawingProblem: 'Draw the outline first.' });
    fireEvent.change(screen.getByLabelText('Area name'), { target: { value: 'Dog run' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save area' }));
    expect((await screen.findByRole('alert')).textContent).toMatch(
      /The drawing is not finished: Draw the outline first/,
    );
    expect(screen.getByLabelText<HTMLInputElement>('Area name').value).toBe('Dog run');
  });

  it('opens a saved area with its name and base depth', () => {
    renderForm({ isSaved: true });
    expect(screen.getByLabelText<HTMLInputElement>('Area name').value).toBe('Back lawn');
    expect(screen.getByLabelText<HTMLInputElement>('Base depth').value).toBe(`0' 3"`);
    expect(screen.getByRole('button', { name: 'Save changes' })).toBeTruthy();
  });
});
