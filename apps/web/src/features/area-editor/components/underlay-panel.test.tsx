import { describe, expect, it } from 'vitest';
import { fireEvent, render, screen, within } from '@testing-library/react';
import type { AreaUnderlayView, MeView } from '@seamwright/shared';
import { testSession, WithSession } from '../../../test/session-fixture';
import { useAreaEditor } from '../hooks/use-area-editor';
import { useUnderlay } from '../hooks/use-underlay';
import { AreaEditor } from './area-editor';

/** A 300 × 200 px sketch, not scaled yet, its top-left corner at the rectangle's (0, 20). */
const sketch: AreaUnderlayView = {
  uploadId: '00000000-0000-4000-8000-00000000f001',
  url: '/api/areas/00000000-0000-4000-8000-00000000a001/underlay?v=1',
  contentType: 'image/png',
  originalName: 'sketch.png',
  widthPx: 300,
  heightPx: 200,
  feetPerPixel: null,
  scale: null,
  offsetFt: { x: 0, y: 20 },
  rotationDeg: 0,
  opacity: 0.5,
};

function Harness({ view }: { view: AreaUnderlayView | null }) {
  const { state, dispatch } = useAreaEditor();
  const underlay = useUnderlay('00000000-0000-4000-8000-00000000a001', view);
  return <AreaEditor state={state} dispatch={dispatch} underlay={underlay} />;
}

function renderEditor(view: AreaUnderlayView | null, me: MeView = testSession()) {
  render(
    <WithSession me={me}>
      <Harness view={view} />
    </WithSession>,
  );
  return screen.getByRole('region', { name: 'Photo or sketch under the drawing' });
}

describe('the underlay panel', () => {
  it('offers a labelled file input before there is a photo', () => {
    const panel = renderEditor(null);
    const input = within(panel).getByLabelText<HTMLInputElement>('Choose a photo or sketch');
    expect(input.type).toBe('file');
    expect(input.accept).toBe('image/jpeg,image/png,image/webp');
    expect(screen.queryByTestId('underlay-image')).toBeNull();
  });

  it('picks both scale points from the keyboard: Enter at the cross, Alt+arrows to move it', () => {
    const panel = renderEditor(sketch);
    fireEvent.click(screen.getByRole('button', { name: 'Start from a rectangle' }));
    expect(screen.getByTestId('underlay-image')).toBeTruthy();
    fireEvent.click(within(panel).getByRole('button', { name: 'Set scale: pick two points' }));
    const drawing = screen.getByRole('application');
    expect(drawing.getAttribute('aria-label')).toMatch(/picking a point on the photo/);
    // Unscaled, the sketch is drawn as wide as the 30 ft rectangle: 0.1 ft per pixel, so the
    // view's centre (15, 10) is pixel (150, 100) (arithmetic).
    fireEvent.keyDown(drawing, { key: 'Enter' });
    expect(within(panel).getByRole('status').textContent).toBe(
      'First point at 150, 100 on the photo. Now click the second point.',
    );
    // Alt+arrow pans a tenth of the 39 ft view (30 ft fitted with a margin): 3.9 ft = 39 px.
    fireEvent.keyDown(drawing, { key: 'ArrowRight', altKey: true });
    fireEvent.keyDown(drawing, { key: 'Enter' });
    expect(within(panel).getByRole('status').textContent).toBe(
      'Second point at 189, 100. Type the distance between the two points.',
    );
    const pointB = within(panel).getByRole('group', { name: 'Point B (pixels on the photo)' });
    expect(within(pointB).getByLabelText<HTMLInputElement>('across').value).toBe('189');
    // Picking is over: Enter adds a drawing point again.
    expect(drawing.getAttribute('aria-label')).toMatch(/points on the line being edited/);
  });

  it('asks for the distance in metres for a metric company and can hide the photo', () => {
    const panel = renderEditor(sketch, testSession({ measurementSystem: 'metric' }));
    expect(within(panel).getByLabelText('Distance from A to B (metres)')).toBeTruthy();
    fireEvent.click(within(panel).getByLabelText('Show the photo'));
    expect(screen.queryByTestId('underlay-image')).toBeNull();
    expect(within(panel).getByRole('status').textContent).toBe('Photo hidden.');
  });

  it('says to save a new area before adding a photo', () => {
    render(
      <WithSession me={testSession()}>
        <NewAreaHarness />
      </WithSession>,
    );
    expect(screen.getByText(/Save the area first/)).toBeTruthy();
    expect(screen.queryByLabelText('Choose a photo or sketch')).toBeNull();
  });
});

function NewAreaHarness() {
  const { state, dispatch } = useAreaEditor();
  return <AreaEditor state={state} dispatch={dispatch} underlay={null} />;
}
