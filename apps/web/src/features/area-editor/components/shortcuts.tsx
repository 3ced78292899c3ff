/** The editor's keys, listed on screen (and read out with the drawing's description). */
export const shortcutList: readonly [keys: string, does: string][] = [
  ['Enter or Space', 'add a point in the middle of the drawing (the blue cross)'],
  [
    'Arrow keys',
    'move the selected point one grid step (Shift: 1 inch or 1 cm); with nothing selected, or with Alt, move the view',
  ],
  ['[ and ]', 'select the previous or next point'],
  ['I or Insert', 'add a point half-way along the side after the selected point'],
  ['Delete or Backspace', 'remove the selected point'],
  ['+ and −, 0', 'zoom in and out, fit the drawing'],
  ['Escape', 'clear the selection'],
  ['Ctrl+Z, Ctrl+Shift+Z or Ctrl+Y', 'undo, redo (anywhere in the editor outside a text box)'],
];

export function Shortcuts({ id }: { id: string }) {
  return (
    <details className="rounded-lg border border-line bg-white p-3" open>
      <summary className="cursor-pointer font-semibold">Keyboard and mouse</summary>
      <div id={id}>
        <p className="mt-2 text-sm">
          Click to add a point after the selected one, drag a point to move it, drag the background
          to move the view, scroll to zoom. The points list below the drawing does everything the
          drawing does.
        </p>
        <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-3 gap-y-1 text-sm">
          {shortcutList.map(([keys, does]) => (
            <div key={keys} className="contents">
              <dt className="font-semibold">{keys}</dt>
              <dd>{does}</dd>
            </div>
          ))}
        </dl>
      </div>
    </details>
  );
}
