/**
 * Bad layout input: a one-line message naming the field and the problem, and the field's
 * path (e.g. `area.holes[0]`, `roll.widthFt`) so an API can attach it to a form field.
 */
export class LayoutInputError extends Error {
  override readonly name = 'LayoutInputError';

  constructor(
    readonly path: string,
    readonly detail: string,
  ) {
    super(/^(must|needs|is) /.test(detail) ? `${path} ${detail}` : `${path}: ${detail}`);
  }
}
