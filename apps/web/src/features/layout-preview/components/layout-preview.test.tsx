import { describe, expect, it } from 'vitest';
import { fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import type { MeView } from '@seamwright/shared';
import { testSession, WithSession } from '../../../test/session-fixture';
import { LayoutPreview } from './layout-preview';

function renderAt(url: string, me: MeView = testSession()) {
  const router = createMemoryRouter([{ path: '/layout', Component: LayoutPreview }], {
    initialEntries: [url],
  });
  render(
    <WithSession me={me}>
      <RouterProvider router={router} />
    </WithSession>,
  );
  return router;
}

const metric = () => testSession({ measurementSystem: 'metric' });

function figure(term: string): HTMLElement {
  const figures = screen.getByRole('group', { name: 'Plan figures' });
  const dt = within(figures).getByText(term, { selector: 'dt' });
  return dt.parentElement as HTMLElement;
}

describe('LayoutPreview', () => {
  it('plans a 30 × 20 ft rectangle, grain east–west, as 600 sq ft in two pieces', () => {
    // Check value: 30 × 20 ft with a 15 ft roll, grain along the 20 ft side → two 15 × 20 ft
    // pieces, 600 sq ft, one 20 ft seam (arithmetic; TRADE.md row 1).
    renderAt(
      `/layout?len=${encodeURIComponent(`30'`)}&wid=${encodeURIComponent(`20'`)}&grain=east-west`,
    );
    expect(within(figure('Turf ordered')).getByText('600 sq ft')).toBeTruthy();
    expect(within(figure('Turf ordered')).getByText('66.67 sq yd')).toBeTruthy();
    expect(within(figure('Pieces')).getByText('2')).toBeTruthy();
    expect(within(figure('Seams')).getByText(`side 20' 0" · butt 0' 0"`)).toBeTruthy();
    expect(screen.getByText(`Piece 1 — 15' 0" × 20' 0"`)).toBeTruthy();
    const drawing = screen.getByRole('img', { name: /Layout plan/ });
    expect(drawing.querySelectorAll('[data-cut]')).toHaveLength(2);
    expect(drawing.querySelectorAll('[data-seam="side"]')).toHaveLength(1);
    expect(
      screen.getByRole('table', { name: 'Cut sheet' }).querySelectorAll('tbody tr'),
    ).toHaveLength(2);
    expect(
      screen.getByText(
        'Using standard estimating defaults; your company’s own settings come later.',
      ),
    ).toBeTruthy();
    expect(
      screen.getByRole('complementary', { name: 'Caution: Turf gets very hot in the sun' }),
    ).toBeTruthy();
  });

  it('shows the length parser’s message under the field as you type, and greys the last plan', async () => {
    renderAt('/layout');
    fireEvent.change(screen.getByLabelText('Width (east–west)'), { target: { value: `20' 14"` } });
    const input = screen.getByLabelText('Width (east–west)');
    expect(input.getAttribute('aria-invalid')).toBe('true');
    expect(screen.getByText(/^Inches must be less than 12/)).toBeTruthy();
    expect(await screen.findByText(/Showing the last plan that worked/)).toBeTruthy();
  });

  it('puts the planner’s refusal in the alert region and writes the typed state to the URL', async () => {
    const router = renderAt('/layout?shape=points');
    fireEvent.change(screen.getByLabelText('Outline points (feet)'), {
      target: { value: '0, 0\n10, 10\n10, 0\n0, 10' },
    });
    await waitFor(() =>
      expect(screen.getAllByRole('alert').map((a) => a.textContent)).toContainEqual(
        expect.stringMatching(/^The outline: ring self-intersects/),
      ),
    );
    expect(router.state.location.search).toContain('pts=0%2C+0%0A10%2C+10');
    expect(screen.getByRole('img', { name: /Layout plan/ }).closest('[data-stale]')).toBeTruthy();
  });

  it('names bed feet in the perimeter and adds edging once the north edge meets a planting bed', async () => {
    const router = renderAt(
      `/layout?len=${encodeURIComponent(`20'`)}&wid=${encodeURIComponent(`30'`)}`,
    );
    expect(within(figure('Perimeter')).getByText(`100' 0" not tagged yet`)).toBeTruthy();
    const north = screen.getByRole('combobox', { name: 'North edge' });
    expect((north as HTMLSelectElement).value).toBe('unknown');
    for (const side of ['East edge', 'South edge', 'West edge'])
      expect(screen.getByRole('combobox', { name: side })).toBeTruthy();
    fireEvent.change(north, { target: { value: 'bed' } });
    // Check value: the north side is the 30 ft east–west width; 20 + 30 + 20 = 70 ft left (arithmetic).
    await waitFor(() =>
      expect(
        within(figure('Perimeter')).getByText(`30' 0" against beds · 70' 0" not tagged yet`),
      ).toBeTruthy(),
    );
    const takeoff = screen.getByRole('table', { name: 'Material takeoff' });
    expect(within(takeoff).getByText('Edging / bender board')).toBeTruthy();
    expect(router.state.location.search).toContain('redges=bed%2Cunknown%2Cunknown%2Cunknown');
  });

  it('shows every length of a metric company in metres and areas in m², and reads metres', async () => {
    renderAt('/layout?grain=east-west', metric());
    // The form opens in metres.
    const length = screen.getByLabelText<HTMLInputElement>('Length (north–south)');
    expect(length.value).toBe('10 m');
    expect(screen.getByText(/^Such as 8.4 m, 840 cm or 8.4/)).toBeTruthy();
    expect(screen.getByRole('radio', { name: '4.57 m' })).toBeTruthy(); // 15 ft × 0.3048
    expect(screen.getByText(/Give both ends as x, y in metres/)).toBeTruthy();

    // A bare number is metres: 9.144 m × 6.096 m is exactly 30 × 20 ft (0.3048 m per ft, exact
    // by the 1959 international yard and pound agreement), so the plan is TRADE.md row 1's.
    fireEvent.change(length, { target: { value: '9.144' } });
    fireEvent.change(screen.getByLabelText('Width (east–west)'), { target: { value: '6.096' } });
    // 600 sq ft × 0.09290304 = 55.74 m²
    await waitFor(() => expect(within(figure('Turf ordered')).getByText('55.74 m²')).toBeTruthy());
    expect(within(figure('Area')).getByText('55.74 m²')).toBeTruthy();
    expect(within(figure('Seams')).getByText('side 6.1 m · butt 0 m')).toBeTruthy(); // 20 ft
    expect(within(figure('Perimeter')).getByText('30.48 m')).toBeTruthy(); // 100 ft
    expect(screen.getByText('Piece 1 — 4.57 m × 6.1 m')).toBeTruthy();
    const sheet = screen.getByRole('table', { name: 'Cut sheet' });
    const firstRow = within(sheet).getAllByRole('row')[1] as HTMLElement;
    expect(within(firstRow).getByText('6.1 m')).toBeTruthy();
    expect(within(firstRow).getByText('4.57 m')).toBeTruthy();
    expect(within(firstRow).getByText(/0–4.57 m from the/)).toBeTruthy();
    expect(sheet.textContent).not.toMatch(/ft|'/);
    const takeoff = screen.getByRole('table', { name: 'Material takeoff' });
    expect(within(takeoff).getAllByText(/m²$/).length).toBeGreaterThan(0);
    expect(within(takeoff).queryByText(/sq ft$/)).toBeNull();
    expect(screen.getByRole('img', { name: /Layout plan/ }).textContent).toMatch(/\d m\b/);
  });

  it('names a metric parse problem under the field', () => {
    renderAt('/layout', metric());
    fireEvent.change(screen.getByLabelText('Width (east–west)'), { target: { value: '8,4 m' } });
    expect(screen.getByLabelText('Width (east–west)').getAttribute('aria-invalid')).toBe('true');
  });
});
