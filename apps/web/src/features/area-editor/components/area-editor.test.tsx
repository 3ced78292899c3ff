import { describe, expect, it } from 'vitest';
import { fireEvent, render, screen, within } from '@testing-library/react';
import type { MeView } from '@seamwright/shared';
import { testSession, WithSession } from '../../../test/session-fixture';
import { useAreaEditor } from '../hooks/use-area-editor';
import { AreaEditor } from './area-editor';

function Harness() {
  const { state, dispatch } = useAreaEditor();
  return <AreaEditor state={state} dispatch={dispatch} />;
}

function renderEditor(me: MeView = testSession()) {
  render(
    <WithSession me={me}>
      <Harness />
    </WithSession>,
  );
}

const area = () => screen.getByTestId('editor-area').textContent;

function typeInto(label: string | RegExp, text: string) {
  const box = screen.getByLabelText(label);
  fireEvent.change(box, { target: { value: text } });
  fireEvent.keyDown(box, { key: 'Enter' });
}

describe('AreaEditor', () => {
  it('draws an L by typing sides, measures it live, and undoes from the keyboard', () => {
    renderEditor();
    expect(screen.getByText(/Draw the outline first/)).toBeTruthy();
    const form = screen.getByRole('form', { name: 'Add a side to the outline' });
    const side = (direction: string, length: string) => {
      fireEvent.change(within(form).getByLabelText('Direction'), { target: { value: direction } });
      fireEvent.change(within(form).getByLabelText('Length (feet)'), { target: { value: length } });
      fireEvent.submit(form);
    };
    // Check value: 40 × 15 + 20 × 10 = 800 sq ft (arithmetic).
    side('0', `40'`);
    side('90', `15'`);
    side('180', '20 ft');
    side('90', `10' 0"`);
    side('180', '20');
    expect(area()).toBe('800 sq ft');
    expect(screen.queryByText(/Draw the outline first/)).toBeNull();
    expect(screen.getByRole('table').querySelectorAll('tbody tr')).toHaveLength(6);
    // The closing side, typed in the list: it runs south from (0, 25) and is 25 ft long.
    expect(screen.getByLabelText<HTMLInputElement>('Side 6 length (point 6 to 1)').value).toBe(
      `25' 0"`,
    );
    fireEvent.keyDown(screen.getByRole('application'), { key: 'z', ctrlKey: true });
    // Without the last side the outline closes from (20, 25) straight to the start: 550 sq ft
    // by the shoelace formula (arithmetic).
    expect(area()).toBe('550 sq ft');
    fireEvent.keyDown(screen.getByRole('application'), { key: 'y', ctrlKey: true });
    expect(area()).toBe('800 sq ft');
  });

  it('starts from a rectangle, takes typed lengths and refuses a crossing with a message', () => {
    renderEditor();
    fireEvent.click(screen.getByRole('button', { name: 'Start from a rectangle' }));
    expect(area()).toBe('600 sq ft');
    typeInto('Side 1 length (point 1 to 2)', `32' 6"`);
    expect(area()).toBe('650 sq ft');
    typeInto('Point 3 north', '-10');
    expect(screen.getByRole('alert').textContent).toMatch(/would cross itself/);
    expect(area()).toBe('650 sq ft');
    typeInto('Side 1 length (point 1 to 2)', 'twelve');
    const box = screen.getByLabelText<HTMLInputElement>('Side 1 length (point 1 to 2)');
    expect(box.getAttribute('aria-invalid')).toBe('true');
    expect(box.value).toBe('twelve');
    expect(area()).toBe('650 sq ft');
  });

  it('nudges and adds points from the keyboard, tags sides and adds a planter', () => {
    renderEditor();
    fireEvent.click(screen.getByRole('button', { name: 'Start from a rectangle' }));
    fireEvent.click(screen.getByRole('button', { name: 'Point 3' }));
    const drawing = screen.getByRole('application');
    fireEvent.keyDown(drawing, { key: 'ArrowUp' });
    fireEvent.keyDown(drawing, { key: 'ArrowUp' });
    // The north-east corner one foot north (two 6 in steps): 30 × 20 + ½ · 30 · 1 = 615 sq ft.
    expect(area()).toBe('615 sq ft');
    fireEvent.change(screen.getByLabelText('Side 3 meets'), { target: { value: 'house' } });
    expect(screen.getByLabelText<HTMLSelectElement>('Side 3 meets').value).toBe('house');
    fireEvent.click(screen.getByLabelText('Side 2 is a tight curve'));
    expect(screen.getByText('Tight curves').nextSibling?.textContent).not.toBe(`0' 0"`);
    fireEvent.click(screen.getByRole('button', { name: 'Add a planter' }));
    // A 3 ft square planter comes off the area: 615 − 9 = 606 sq ft.
    expect(area()).toBe('606 sq ft');
    expect(screen.getByRole('table').querySelector('caption')?.textContent).toMatch(/^Planter 1/);
  });

  it('shows metres to a metric company', () => {
    renderEditor(testSession({ measurementSystem: 'metric' }));
    fireEvent.click(screen.getByRole('button', { name: 'Start from a rectangle' }));
    expect(area()).toBe('55.74 m²');
    expect(screen.getByLabelText<HTMLInputElement>('Side 1 length (point 1 to 2)').value).toBe(
      '9.14 m',
    );
    typeInto('Side 1 length (point 1 to 2)', '10');
    // 10 m × 20 ft (6.096 m) = 60.96 m².
    expect(area()).toBe('60.96 m²');
  });
});
