import {
  useEffect,
  useRef,
  useState,
  type Dispatch,
  type KeyboardEvent,
  type PointerEvent,
} from 'react';
import { metresToFeet } from '@seamwright/takeoff';
import { useUnits } from '../../../lib/units';
import type { EditorAction } from '../model/actions';
import { lineOf } from '../model/lines';
import type { EditorState, LineRef, Pt } from '../model/types';
import { fitView, gridStepFor, panView, zoomView, type View } from '../model/view';
import type { UnderlayDrawing } from '../model/underlay';
import { GridLayer, HandlesLayer, OutlineLayers, TurfLayer, svgY } from './canvas-layers';
import { UnderlayImage, UnderlayMarks } from './underlay-layer';

/** Height ÷ width of the drawing; the CSS aspect ratio matches so clicks map exactly. */
const ASPECT = 0.7;
/** How far (screen pixels) a point is pulled onto a square-up. */
const SNAP_PX = 10;
/** A press that moves less than this (pixels) is a click, not a pan. */
const CLICK_PX = 4;

type Press = { kind: 'handle' } | { kind: 'pan'; x: number; y: number; view: View; moved: boolean };

export function allPoints(state: EditorState): Pt[] {
  const { doc } = state;
  return [doc.outer, ...doc.holes, ...doc.paths].flatMap((line) => [...line.points]);
}

/**
 * The drawing: a grid in feet, the turf, holes, walkways and point handles. Click to add a
 * point, drag a point to move it, drag the background to pan, wheel to zoom. From the keyboard
 * (focus on the drawing): Enter adds a point in the middle, arrows nudge the selected point.
 */
export function EditorCanvas({
  state,
  dispatch,
  fitSignal,
  describedBy,
  underlay = null,
  onPick = null,
}: {
  state: EditorState;
  dispatch: Dispatch<EditorAction>;
  /** Changes when the drawing should be fitted to the view again (a template, a load). */
  fitSignal: number;
  describedBy: string;
  /** The photo or sketch drawn under the grid. */
  underlay?: UnderlayDrawing | null;
  /** While picking scale points, a click (or Enter at the cross) picks instead of drawing. */
  onPick?: ((point: Pt) => void) | null;
}) {
  const units = useUnits();
  const svgRef = useRef<SVGSVGElement>(null);
  const [view, setView] = useState<View>(() => fitView(allPoints(state), ASPECT));
  const [press, setPress] = useState<Press | null>(null);
  const [isFocused, setFocused] = useState(false);
  const height = view.widthFt * ASPECT;
  const unit = view.widthFt / 60;

  const [fitted, setFitted] = useState(fitSignal);
  if (fitted !== fitSignal) {
    setFitted(fitSignal);
    setView(fitView(allPoints(state), ASPECT));
  }

  // Wheel zoom needs a non-passive listener to keep the page from scrolling.
  useEffect(() => {
    const svg = svgRef.current;
    if (!svg) return;
    const onWheel = (event: WheelEvent) => {
      event.preventDefault();
      const factor = event.deltaY < 0 ? 1.15 : 1 / 1.15;
      setView((current) =>
        zoomView(current, factor, toYard(svg, current, event.clientX, event.clientY)),
      );
    };
    svg.addEventListener('wheel', onWheel, { passive: false });
    return () => svg.removeEventListener('wheel', onWheel);
  }, []);

  const ftPerPx = () => view.widthFt / (svgRef.current?.getBoundingClientRect().width || 600);
  const yardAt = (event: PointerEvent) =>
    svgRef.current ? toYard(svgRef.current, view, event.clientX, event.clientY) : ([0, 0] as Pt);

  const onGrab = (line: LineRef, index: number, event: PointerEvent) => {
    event.stopPropagation();
    svgRef.current?.setPointerCapture?.(event.pointerId);
    dispatch({ type: 'dragStart', line, index });
    setPress({ kind: 'handle' });
  };

  const coarse = state.snapping.gridFt ?? (units.system === 'metric' ? metresToFeet(0.1) : 1);
  const fine = units.system === 'metric' ? metresToFeet(0.01) : 1 / 12;

  const onKeyDown = (event: KeyboardEvent<SVGSVGElement>) => {
    const arrows: Record<string, Pt> = {
      ArrowLeft: [-1, 0],
      ArrowRight: [1, 0],
      ArrowUp: [0, 1],
      ArrowDown: [0, -1],
    };
    const arrow = arrows[event.key];
    const handled = () => event.preventDefault();
    if (arrow) {
      handled();
      if (state.selected !== null && !event.altKey) {
        const step = event.shiftKey ? fine : coarse;
        dispatch({ type: 'nudge', dx: arrow[0] * step, dy: arrow[1] * step });
      } else setView((v) => panView(v, arrow[0] * v.widthFt * 0.1, arrow[1] * v.widthFt * 0.1));
      return;
    }
    switch (event.key) {
      case 'Enter':
      case ' ':
        handled();
        if (onPick) return onPick([view.cx, view.cy]);
        dispatch({ type: 'addPoint', point: [view.cx, view.cy], toleranceFt: SNAP_PX * ftPerPx() });
        return;
      case '[':
        handled();
        dispatch({ type: 'selectStep', step: -1 });
        return;
      case ']':
        handled();
        dispatch({ type: 'selectStep', step: 1 });
        return;
      case 'Delete':
      case 'Backspace':
        handled();
        dispatch({ type: 'deletePoint' });
        return;
      case 'Insert':
      case 'i':
        handled();
        if (state.selected !== null) dispatch({ type: 'splitSide', index: state.selected });
        return;
      case '+':
      case '=':
        handled();
        setView((v) => zoomView(v, 1.25));
        return;
      case '-':
      case '_':
        handled();
        setView((v) => zoomView(v, 1 / 1.25));
        return;
      case '0':
        handled();
        setView(fitView(allPoints(state), ASPECT));
        return;
      case 'Escape':
        handled();
        dispatch({ type: 'select', line: state.active, index: null });
        return;
    }
  };

  const activePoints = lineOf(state.doc, state.active)?.points.length ?? 0;
  return (
    <div className="flex flex-col gap-2">
      <div className="flex flex-wrap gap-2" role="group" aria-label="Zoom">
        <ZoomButton label="Zoom in" text="+" onClick={() => setView((v) => zoomView(v, 1.25))} />
        <ZoomButton
          label="Zoom out"
          text="−"
          onClick={() => setView((v) => zoomView(v, 1 / 1.25))}
        />
        <ZoomButton
          label="Fit the drawing"
          text="Fit"
          onClick={() => setView(fitView(allPoints(state), ASPECT))}
        />
        <span className="self-center text-sm text-ink-muted">
          View {units.length(view.widthFt)} across · grid{' '}
          {units.length(gridStepFor(view, state.snapping.gridFt))}
        </span>
      </div>
      <svg
        ref={svgRef}
        role="application"
        aria-roledescription="area drawing"
        aria-label={
          onPick
            ? 'Area drawing, picking a point on the photo: click it, or move the cross with Alt+arrows and press Enter'
            : `Area drawing, ${activePoints} points on the line being edited`
        }
        aria-describedby={describedBy}
        tabIndex={0}
        viewBox={`${view.cx - view.widthFt / 2} ${svgY(view.cy + height / 2)} ${view.widthFt} ${height}`}
        preserveAspectRatio="xMidYMid meet"
        className="block w-full touch-none select-none rounded-lg border border-line-strong bg-white"
        style={{ aspectRatio: `${1 / ASPECT}` }}
        onKeyDown={onKeyDown}
        onFocus={() => setFocused(true)}
        onBlur={() => setFocused(false)}
        onPointerDown={(event) => {
          if (event.button !== 0) return;
          event.currentTarget.setPointerCapture?.(event.pointerId);
          setPress({ kind: 'pan', x: event.clientX, y: event.clientY, view, moved: false });
        }}
        onPointerMove={(event) => {
          if (!press) return;
          if (press.kind === 'handle') {
            dispatch({ type: 'dragMove', point: yardAt(event), toleranceFt: SNAP_PX * ftPerPx() });
            return;
          }
          const dx = event.clientX - press.x;
          const dy = event.clientY - press.y;
          if (!press.moved && Math.hypot(dx, dy) < CLICK_PX) return;
          const scale =
            press.view.widthFt / (event.currentTarget.getBoundingClientRect().width || 600);
          setPress({ ...press, moved: true });
          setView(panView(press.view, -dx * scale, dy * scale));
        }}
        onPointerUp={(event) => {
          if (press?.kind === 'handle') dispatch({ type: 'dragEnd' });
          else if (press && !press.moved && onPick) onPick(yardAt(event));
          else if (press && !press.moved)
            dispatch({ type: 'addPoint', point: yardAt(event), toleranceFt: SNAP_PX * ftPerPx() });
          setPress(null);
        }}
        onPointerCancel={() => {
          if (press?.kind === 'handle') dispatch({ type: 'dragEnd' });
          setPress(null);
        }}
      >
        {underlay ? <UnderlayImage drawing={underlay} /> : null}
        <GridLayer view={view} height={height} step={gridStepFor(view, state.snapping.gridFt)} />
        <TurfLayer doc={state.doc} faint={underlay !== null} />
        <OutlineLayers doc={state.doc} unit={unit} />
        {underlay ? <UnderlayMarks drawing={underlay} unit={unit} /> : null}
        <HandlesLayer
          doc={state.doc}
          active={state.active}
          selected={state.selected}
          unit={unit}
          onGrab={onGrab}
        />
        {isFocused ? (
          <g
            aria-hidden="true"
            stroke="#1d4ed8"
            strokeWidth={1.5}
            vectorEffect="non-scaling-stroke"
          >
            <line
              x1={view.cx - unit * 2}
              x2={view.cx + unit * 2}
              y1={svgY(view.cy)}
              y2={svgY(view.cy)}
              vectorEffect="non-scaling-stroke"
            />
            <line
              x1={view.cx}
              x2={view.cx}
              y1={svgY(view.cy) - unit * 2}
              y2={svgY(view.cy) + unit * 2}
              vectorEffect="non-scaling-stroke"
            />
          </g>
        ) : null}
      </svg>
    </div>
  );
}

function ZoomButton({
  label,
  text,
  onClick,
}: {
  label: string;
  text: string;
  onClick: () => void;
}) {
  return (
    <button
      type="button"
      aria-label={label}
      title={label}
      onClick={onClick}
      className="min-h-11 min-w-11 rounded-md border border-line-strong bg-white px-3 font-semibold text-moss-800 hover:bg-sand-100"
    >
      {text}
    </button>
  );
}

/** Screen position to yard feet, by the drawing's box (its aspect matches the view's). */
function toYard(svg: SVGSVGElement, view: View, clientX: number, clientY: number): Pt {
  const rect = svg.getBoundingClientRect();
  const width = rect.width || 1;
  const heightPx = rect.height || width * ASPECT;
  const heightFt = view.widthFt * ASPECT;
  return [
    view.cx - view.widthFt / 2 + ((clientX - rect.left) / width) * view.widthFt,
    view.cy + heightFt / 2 - ((clientY - rect.top) / heightPx) * heightFt,
  ];
}
