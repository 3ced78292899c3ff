import { useId, type Dispatch } from 'react';
import type { EdgeTag } from '@seamwright/takeoff';
import { Button } from '../../../components/ui/button';
import { useUnits } from '../../../lib/units';
import type { EditorAction } from '../model/actions';
import { isClosed, lineOf } from '../model/lines';
import { directionDeg } from '../model/ring-edits';
import type { EditorState, Pt } from '../model/types';
import { lineName, tagLabels, tagOrder } from '../model/words';
import { AngleInput } from './angle-input';
import { LengthInput } from './length-input';

const cell = 'border-b border-line px-2 py-2 align-top';

/**
 * The active line as a table: every point's position and every side's length, direction, what
 * it meets and whether it is a tight curve, all editable. It is the drawing's text alternative
 * and the keyboard's way to draw precisely.
 */
export function PointsTable({
  state,
  dispatch,
}: {
  state: EditorState;
  dispatch: Dispatch<EditorAction>;
}) {
  const units = useUnits();
  const uid = useId();
  const line = lineOf(state.doc, state.active);
  if (!line) return null;
  const closed = isClosed(state.active);
  const name = lineName(state.doc, state.active);
  const points = line.points;
  const tags = 'tags' in line ? line : null;
  if (points.length === 0)
    return (
      <p className="text-ink-muted">
        The {name.toLowerCase()} has no points yet: click on the drawing, add sides below, or start
        from a shape.
      </p>
    );
  const sideEnd = (i: number): Pt | undefined =>
    closed ? points[(i + 1) % points.length] : points[i + 1];
  // relative: the visually hidden labels inside stay within the scroll box on a phone.
  return (
    <div className="relative overflow-x-auto rounded-lg border border-line bg-white">
      <table className="w-full min-w-[40rem] border-collapse text-left">
        <caption className="px-2 py-2 text-left font-semibold">
          {name}: {points.length} points{closed ? ` and ${points.length} sides` : ''} (positions
          from the start, east and north)
        </caption>
        <thead>
          <tr className="bg-sand-100">
            <th scope="col" className={cell}>
              Point
            </th>
            <th scope="col" className={cell}>
              East
            </th>
            <th scope="col" className={cell}>
              North
            </th>
            <th scope="col" className={cell}>
              Side to next point
            </th>
            <th scope="col" className={cell}>
              Direction (°)
            </th>
            {tags ? (
              <th scope="col" className={cell}>
                Meets
              </th>
            ) : null}
            {tags ? (
              <th scope="col" className={cell}>
                Tight curve
              </th>
            ) : null}
            <th scope="col" className={cell}>
              <span className="sr-only">Actions</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {points.map((point, i) => {
            const end = sideEnd(i);
            const n = i + 1;
            const isSelected = state.selected === i;
            const next = closed ? ((i + 1) % points.length) + 1 : n + 1;
            return (
              <tr key={i} className={isSelected ? 'bg-sand-100' : undefined}>
                <th scope="row" className={cell}>
                  <Button
                    variant="quiet"
                    className="px-2"
                    aria-pressed={isSelected}
                    aria-label={`Point ${n}`}
                    onClick={() =>
                      dispatch({ type: 'select', line: state.active, index: isSelected ? null : i })
                    }
                  >
                    {n}
                  </Button>
                </th>
                <td className={cell}>
                  <LengthInput
                    label={`Point ${n} east`}
                    feet={point[0]}
                    allowNegative
                    onCommit={(x) =>
                      dispatch({ type: 'movePoint', index: i, point: [x, point[1]] })
                    }
                  />
                </td>
                <td className={cell}>
                  <LengthInput
                    label={`Point ${n} north`}
                    feet={point[1]}
                    allowNegative
                    onCommit={(y) =>
                      dispatch({ type: 'movePoint', index: i, point: [point[0], y] })
                    }
                  />
                </td>
                {end && points.length > 1 ? (
                  <>
                    <td className={cell}>
                      <LengthInput
                        label={`Side ${n} length (point ${n} to ${next})`}
                        feet={Math.hypot(end[0] - point[0], end[1] - point[1])}
                        onCommit={(lengthFt) =>
                          dispatch({ type: 'setSideLength', index: i, lengthFt })
                        }
                      />
                    </td>
                    <td className={cell}>
                      <AngleInput
                        label={`Side ${n} direction in degrees from east`}
                        angleDeg={directionDeg(point, end)}
                        onCommit={(angleDeg) =>
                          dispatch({ type: 'setSideAngle', index: i, angleDeg })
                        }
                      />
                    </td>
                  </>
                ) : (
                  <td className={cell} colSpan={2}>
                    <span className="text-ink-muted">{closed ? '—' : 'End of walkway'}</span>
                  </td>
                )}
                {tags ? (
                  <td className={cell}>
                    <label
                      className="sr-only"
                      htmlFor={`${uid}-side-${i}-meets`}
                    >{`Side ${n} meets`}</label>
                    <select
                      id={`${uid}-side-${i}-meets`}
                      className="block min-h-11 rounded-md border border-line-strong bg-white px-2"
                      value={tags.tags[i] ?? ''}
                      onChange={(event) =>
                        dispatch({
                          type: 'setTag',
                          line: state.active,
                          index: i,
                          tag: event.target.value === '' ? null : (event.target.value as EdgeTag),
                        })
                      }
                    >
                      <option value="">Not sure</option>
                      {tagOrder.map((tag) => (
                        <option key={tag} value={tag}>
                          {tagLabels[tag]}
                        </option>
                      ))}
                    </select>
                  </td>
                ) : null}
                {tags ? (
                  <td className={cell}>
                    <input
                      type="checkbox"
                      className="h-6 w-6"
                      aria-label={`Side ${n} is a tight curve`}
                      checked={tags.curved[i] ?? false}
                      onChange={(event) =>
                        dispatch({
                          type: 'setCurved',
                          line: state.active,
                          index: i,
                          curved: event.target.checked,
                        })
                      }
                    />
                  </td>
                ) : null}
                <td className={`${cell} whitespace-nowrap`}>
                  {end && points.length > 1 ? (
                    <Button
                      variant="quiet"
                      className="px-2"
                      // The name starts with the visible word (WCAG 2.5.3, label in name).
                      aria-label={`Split side ${n} (add a point half-way)`}
                      onClick={() => dispatch({ type: 'splitSide', index: i })}
                    >
                      Split
                    </Button>
                  ) : null}
                  <Button
                    variant="quietDanger"
                    className="px-2"
                    aria-label={`Remove point ${n}`}
                    onClick={() => dispatch({ type: 'deletePoint', index: i })}
                  >
                    Remove
                  </Button>
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
      <p className="px-2 py-2 text-sm text-ink-muted">
        Lengths read {units.lengthExamples.replace(/^Such as/, 'like')}. A new side length moves the
        points after it; the next side running the same way takes up the difference, so square
        corners stay square.
      </p>
    </div>
  );
}
