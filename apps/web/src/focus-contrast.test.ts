// Every focus ring must reach 3:1 against the surface it is drawn on (WCAG 2.2 AA, 1.4.11 and
// 2.4.7). The colours are read from the theme in index.css, so changing a token re-checks it.
import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { colord, extend } from 'colord';
import a11yPlugin from 'colord/plugins/a11y';
import { describe, expect, it } from 'vitest';

extend([a11yPlugin]);

// Through node:path, because happy-dom replaces the global URL with one that knows no file: URLs.
const css = readFileSync(join(dirname(fileURLToPath(import.meta.url)), 'index.css'), 'utf8');

function token(name: string): string {
  if (name === 'white') return '#ffffff';
  const match = new RegExp(`--color-${name}:\\s*(#[0-9a-fA-F]{3,8})\\s*;`).exec(css);
  if (!match?.[1]) throw new Error(`index.css has no --color-${name}`);
  return match[1];
}

/** Which ring is drawn on which surfaces; a new surface colour gets a line here. */
const ringsBySurface = {
  // Pages, cards, dialogs, the phone header and bottom bar (moss-50 is its active tab).
  focus: ['white', 'sand-50', 'sand-100', 'sand-200', 'moss-50'],
  // The desktop rail, its open menus and hover rows, and toasts.
  'focus-on-dark': ['moss-900', 'moss-800', 'moss-700'],
} as const;

describe('focus ring contrast', () => {
  for (const [ring, surfaces] of Object.entries(ringsBySurface)) {
    for (const surface of surfaces) {
      it(`--color-${ring} on --color-${surface} is at least 3:1`, () => {
        const ratio = colord(token(ring)).contrast(token(surface));
        expect(ratio).toBeGreaterThanOrEqual(3);
      });
    }
  }

  it('styles the dark surfaces with their own ring', () => {
    expect(css).toMatch(
      /\[data-surface='dark'\] :focus-visible \{\s*outline-color: var\(--color-focus-on-dark\);/,
    );
  });
});
