import { useId, useState } from 'react';
import type { PixelPoint } from '@seamwright/shared';
import { Button } from '../../../components/ui/button';
import { useUnits } from '../../../lib/units';
import type { UnderlayControls } from '../hooks/use-underlay';
import { pointsDistinct } from '../model/underlay';

/**
 * Setting the scale: two points on the photo (clicked on the drawing, or typed as pixels for
 * the keyboard) and the distance between them as measured, in the company's units.
 */
export function UnderlayScaleForm({ controls }: { controls: UnderlayControls }) {
  const units = useUnits();
  const id = useId();
  const { view, points, picking } = controls;
  const [text, setText] = useState(() => (view?.scale ? units.length(view.scale.distanceFt) : ''));
  const [error, setError] = useState<string | null>(null);
  if (!view) return null;
  const ready = pointsDistinct(points.a, points.b);
  return (
    <form
      aria-label="Scale of the photo"
      className="flex flex-col gap-3 border-t border-line pt-3"
      onSubmit={(event) => {
        event.preventDefault();
        if (!ready) {
          setError('Pick two different points on the photo first.');
          return;
        }
        const read = units.parseLength(text);
        if (!read.ok || read.feet <= 0) {
          setError(read.ok ? 'The distance must be more than 0.' : read.error.message);
          return;
        }
        setError(null);
        controls.saveScale(read.feet, units.length(read.feet));
      }}
    >
      <p className="text-sm">
        {view.feetPerPixel
          ? `To scale: A to B is ${units.length(view.scale?.distanceFt ?? 0)}.`
          : 'Not to scale yet: pick two points you know the distance between, such as the ends of a fence or a patio side.'}
      </p>
      <div className="flex flex-wrap gap-2">
        {picking ? (
          <Button variant="secondary" onClick={controls.cancelPicking}>
            Stop picking points
          </Button>
        ) : (
          <Button variant="secondary" onClick={controls.startPicking}>
            {points.a ? 'Pick the two points again' : 'Set scale: pick two points'}
          </Button>
        )}
      </div>
      <div className="grid grid-cols-2 gap-2">
        <PointFields
          name="A"
          point={points.a}
          max={view}
          onChange={(p) => controls.setPoint('a', p)}
        />
        <PointFields
          name="B"
          point={points.b}
          max={view}
          onChange={(p) => controls.setPoint('b', p)}
        />
      </div>
      <div className="flex flex-wrap items-end gap-2">
        <div className="flex w-44 flex-col gap-1">
          <label htmlFor={`${id}-distance`} className="text-sm font-semibold">
            Distance from A to B ({units.lengthWord})
          </label>
          <input
            id={`${id}-distance`}
            value={text}
            autoComplete="off"
            spellCheck={false}
            aria-invalid={error ? true : undefined}
            aria-describedby={`${id}-distance-note`}
            className="block min-h-11 w-full rounded-md border border-line-strong bg-white px-2 tabular-nums aria-[invalid=true]:border-brick-700 aria-[invalid=true]:bg-brick-50"
            onChange={(event) => setText(event.target.value)}
          />
        </div>
        <Button type="submit" variant="secondary" disabled={controls.busy}>
          Save scale
        </Button>
      </div>
      <p
        id={`${id}-distance-note`}
        className={error ? 'text-sm font-semibold text-brick-700' : 'text-sm text-ink-muted'}
      >
        {error ?? units.lengthExamples}
      </p>
    </form>
  );
}

function PointFields({
  name,
  point,
  max,
  onChange,
}: {
  name: string;
  point: PixelPoint | null;
  max: { widthPx: number; heightPx: number };
  onChange: (point: PixelPoint) => void;
}) {
  const id = useId();
  const field = (axis: 'x' | 'y', limit: number) => (
    <div className="flex flex-col gap-1">
      <label htmlFor={`${id}-${axis}`} className="text-sm">
        {axis === 'x' ? 'across' : 'down'}
      </label>
      <input
        id={`${id}-${axis}`}
        type="number"
        min={0}
        max={limit}
        step={1}
        value={point ? point[axis] : ''}
        className="block min-h-11 w-full rounded-md border border-line-strong bg-white px-2 tabular-nums"
        onChange={(event) => {
          const value = Number(event.target.value);
          if (!Number.isFinite(value)) return;
          const next = { x: point?.x ?? 0, y: point?.y ?? 0, [axis]: value };
          onChange(next);
        }}
      />
    </div>
  );
  return (
    <fieldset className="flex flex-col gap-1">
      <legend className="text-sm font-semibold">Point {name} (pixels on the photo)</legend>
      <div className="grid grid-cols-2 gap-2">
        {field('x', max.widthPx)}
        {field('y', max.heightPx)}
      </div>
    </fieldset>
  );
}
