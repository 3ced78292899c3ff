import { useEffect, useRef, useState } from 'react';
import { imageContentTypes, maxUploadBytes } from '@seamwright/shared';
import type { AreaUnderlayView, PixelPoint } from '@seamwright/shared';
import { isApiError } from '../../../lib/api-client';
import { removeUnderlay, saveUnderlayScale, uploadUnderlay } from '../api/underlay';
import { pixelOnImage, placementOf } from '../model/underlay';
import type { UnderlayDrawing } from '../model/underlay';
import type { Pt } from '../model/types';

export type PickStep = 'a' | 'b' | null;

interface Local {
  offsetFt: { x: number; y: number };
  rotationDeg: number;
  opacity: number;
}

const localOf = (view: AreaUnderlayView | null): Local => ({
  offsetFt: view?.offsetFt ?? { x: 0, y: 0 },
  rotationDeg: view?.rotationDeg ?? 0,
  opacity: view?.opacity ?? 0.5,
});

const messageOf = (error: unknown) =>
  isApiError(error) ? (error.fieldErrors[0]?.message ?? error.detail) : 'Something went wrong.';

/** How long moves and turns wait before they are saved, so a run of key presses is one save. */
const SAVE_DELAY_MS = 600;

/**
 * The photo or sketch under one saved area: what is shown (the saved view plus moves, turns
 * and opacity not yet saved), the two scale points being picked, and a status line in words.
 * `onChanged` lets the page refresh the area it read.
 */
export function useUnderlay(
  areaId: string,
  initial: AreaUnderlayView | null,
  onChanged?: () => void,
) {
  const [view, setView] = useState(initial);
  const [local, setLocal] = useState<Local>(() => localOf(initial));
  const [hidden, setHidden] = useState(false);
  const [picking, setPicking] = useState<PickStep>(null);
  const [points, setPoints] = useState<{ a: PixelPoint | null; b: PixelPoint | null }>({
    a: initial?.scale?.a ?? null,
    b: initial?.scale?.b ?? null,
  });
  const [status, setStatus] = useState('');
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const pendingSave = useRef<ReturnType<typeof setTimeout> | null>(null);
  useEffect(() => () => clearTimeout(pendingSave.current ?? undefined), []);

  const run = async (work: () => Promise<void>) => {
    setBusy(true);
    setError(null);
    try {
      await work();
      onChanged?.();
    } catch (caught) {
      setError(messageOf(caught));
    } finally {
      setBusy(false);
    }
  };

  const shown = (next: AreaUnderlayView | null) => {
    setView(next);
    setLocal(localOf(next));
    setPoints({ a: next?.scale?.a ?? null, b: next?.scale?.b ?? null });
  };

  const choose = (file: File) => {
    if (file.size > maxUploadBytes) {
      setError('The file is larger than 10 MB. Choose a smaller photo.');
      return;
    }
    if (file.type && !(imageContentTypes as readonly string[]).includes(file.type)) {
      setError('Choose a JPEG, PNG or WebP image.');
      return;
    }
    void run(async () => {
      shown(await uploadUnderlay(areaId, file));
      setHidden(false);
      setPicking(null);
      setStatus('Photo added under the drawing. Set its scale next.');
    });
  };

  const saveScale = (distanceFt: number, spoken: string) => {
    const { a, b } = points;
    if (!a || !b) return;
    void run(async () => {
      shown(await saveUnderlayScale(areaId, { a, b, distanceFt, ...local }));
      setPicking(null);
      setStatus(`Scale set: the two points are ${spoken} apart.`);
    });
  };

  /** Moves, turns and opacity save themselves once a scale exists (the route needs it). */
  const changeLocal = (next: Local, words: string) => {
    setLocal(next);
    setStatus(words);
    const scale = view?.scale;
    if (!scale) return;
    clearTimeout(pendingSave.current ?? undefined);
    pendingSave.current = setTimeout(() => {
      void run(async () => {
        setView(await saveUnderlayScale(areaId, { ...scale, ...next }));
        setStatus('Photo position saved.');
      });
    }, SAVE_DELAY_MS);
  };

  const remove = () =>
    void run(async () => {
      await removeUnderlay(areaId);
      shown(null);
      setPicking(null);
      setStatus('Photo removed.');
    });

  const drawing = (outline: readonly Pt[]): UnderlayDrawing | null =>
    view && !hidden
      ? {
          href: view.url,
          widthPx: view.widthPx,
          heightPx: view.heightPx,
          placement: placementOf(view, local, outline),
          opacity: local.opacity,
          marks: [points.a, points.b].filter((p): p is PixelPoint => p !== null),
        }
      : null;

  /** A click on the drawing while picking: the point on the photo under it. */
  const pick = (point: Pt, outline: readonly Pt[]) => {
    const current = drawing(outline);
    if (!current || !picking) return;
    const pixel = pixelOnImage(current, point);
    if (!pixel) {
      setStatus('That point is off the photo. Click on the photo.');
      return;
    }
    setPoints((p) => ({ ...p, [picking]: pixel }));
    setPicking(picking === 'a' ? 'b' : null);
    setStatus(
      picking === 'a'
        ? `First point at ${pixel.x}, ${pixel.y} on the photo. Now click the second point.`
        : `Second point at ${pixel.x}, ${pixel.y}. Type the distance between the two points.`,
    );
  };

  return {
    view,
    local,
    hidden,
    picking,
    points,
    status,
    error,
    busy,
    choose,
    saveScale,
    remove,
    pick,
    drawing,
    setHidden: (value: boolean) => {
      setHidden(value);
      setStatus(value ? 'Photo hidden.' : 'Photo shown.');
    },
    startPicking: () => {
      setHidden(false);
      setPicking('a');
      setStatus('Click the first of two points whose distance you know, on the photo.');
    },
    cancelPicking: () => {
      setPicking(null);
      setStatus('Picking points stopped.');
    },
    setPoint: (which: 'a' | 'b', point: PixelPoint) => setPoints((p) => ({ ...p, [which]: point })),
    changeLocal,
  };
}

export type UnderlayControls = ReturnType<typeof useUnderlay>;
