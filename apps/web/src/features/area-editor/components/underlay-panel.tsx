import { useId } from 'react';
import { Button } from '../../../components/ui/button';
import type { UnderlayControls } from '../hooks/use-underlay';
import { UnderlayPosition } from './underlay-position';
import { UnderlayScaleForm } from './underlay-scale-form';

const boxClasses = 'flex flex-col gap-3 rounded-lg border border-line bg-white p-3';

/**
 * "Underlay": a photo or sketch of the yard under the drawing, to trace over. Choose it, set
 * its scale from two points a known distance apart, move and turn it, see through it, hide or
 * remove it. `controls` is null for an area not saved yet (the photo belongs to a saved area).
 */
export function UnderlayPanel({ controls }: { controls: UnderlayControls | null }) {
  const id = useId();
  const headingId = `${id}-heading`;
  if (!controls)
    return (
      <section aria-labelledby={headingId} className={boxClasses}>
        <h3 id={headingId} className="font-semibold">
          Photo or sketch under the drawing
        </h3>
        <p className="text-sm text-ink-muted">
          Save the area first; then you can put a photo or sketch of the yard under its drawing.
        </p>
      </section>
    );
  const { view, local, hidden, busy } = controls;
  return (
    <section aria-labelledby={headingId} className={boxClasses}>
      <h3 id={headingId} className="font-semibold">
        Photo or sketch under the drawing
      </h3>
      <div className="flex flex-col gap-1">
        <label htmlFor={`${id}-file`} className="text-sm font-semibold">
          {view ? 'Replace the photo or sketch' : 'Choose a photo or sketch'}
        </label>
        <input
          id={`${id}-file`}
          type="file"
          accept="image/jpeg,image/png,image/webp"
          disabled={busy}
          aria-describedby={`${id}-file-hint`}
          className="block w-full min-h-11 text-sm file:mr-3 file:min-h-11 file:rounded-md file:border file:border-line-strong file:bg-white file:px-3 file:font-semibold file:text-moss-800"
          onChange={(event) => {
            const file = event.target.files?.[0];
            if (file) controls.choose(file);
            event.target.value = '';
          }}
        />
        <p id={`${id}-file-hint`} className="text-sm text-ink-muted">
          JPEG, PNG or WebP, up to 10 MB.
        </p>
      </div>
      {view ? (
        <>
          <p className="text-sm">
            <span className="font-semibold">{view.originalName}</span>, {view.widthPx} ×{' '}
            {view.heightPx} pixels
          </p>
          <div className="flex flex-wrap items-center gap-4">
            <label className="flex min-h-11 items-center gap-2">
              <input
                type="checkbox"
                className="size-5"
                checked={!hidden}
                onChange={(event) => controls.setHidden(!event.target.checked)}
              />
              Show the photo
            </label>
            <div className="flex flex-col gap-1">
              <label htmlFor={`${id}-opacity`} className="text-sm font-semibold">
                Photo strength ({Math.round(local.opacity * 100)}%)
              </label>
              <input
                id={`${id}-opacity`}
                type="range"
                min={5}
                max={100}
                step={5}
                value={Math.round(local.opacity * 100)}
                className="min-h-11 w-40"
                onChange={(event) =>
                  controls.changeLocal(
                    { ...local, opacity: Number(event.target.value) / 100 },
                    `Photo strength ${event.target.value}%.`,
                  )
                }
              />
            </div>
          </div>
          <UnderlayScaleForm controls={controls} />
          {view.scale ? <UnderlayPosition controls={controls} /> : null}
          <Button variant="quietDanger" onClick={controls.remove} disabled={busy}>
            Remove the photo
          </Button>
        </>
      ) : null}
      <p role="status" aria-live="polite" className="text-sm text-ink-muted">
        {controls.status}
      </p>
      {controls.error ? (
        <p role="alert" className="text-sm font-semibold text-brick-700">
          {controls.error}
        </p>
      ) : null}
    </section>
  );
}
