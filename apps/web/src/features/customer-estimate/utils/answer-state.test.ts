import { describe, expect, it } from 'vitest';
import { ErrorCode } from '@seamwright/shared';
import { ApiError } from '../../../lib/api-error';
import { acceptSchemaFor, deadLinkOf, pageStateOf } from './answer-state';
import { viewFixture } from '../../../test/public-estimate-fixture';

// The rules are the public accept route's (DEVELOPERS.md "Sending and acceptance"): a
// multi-tier estimate needs a tierId, one tier needs none.
describe('acceptSchemaFor', () => {
  it('asks for an option when there are several', () => {
    const schema = acceptSchemaFor(['a', 'b']);
    const missing = schema.safeParse({ name: 'Osric Fennimore', tierId: '' });
    expect(missing.success).toBe(false);
    expect(missing.error?.issues.map((issue) => [issue.path.join('.'), issue.message])).toEqual([
      ['tierId', 'Choose one of the options'],
    ]);
    expect(schema.safeParse({ name: 'Osric', tierId: 'c' }).success).toBe(false);
    expect(schema.parse({ name: ' Osric Fennimore ', tierId: 'b' })).toEqual({
      name: 'Osric Fennimore',
      tierId: 'b',
    });
  });

  it('takes the only option without asking, and always wants a name', () => {
    const schema = acceptSchemaFor(['only']);
    expect(schema.parse({ name: 'Osric', tierId: '' })).toEqual({ name: 'Osric', tierId: 'only' });
    const noName = schema.safeParse({ name: '   ', tierId: '' });
    expect(noName.error?.issues[0]?.message).toBe('Your full name is required');
  });
});

describe('pageStateOf', () => {
  it('is open while unanswered, and shows an answer or a newer version otherwise', () => {
    expect(pageStateOf(viewFixture())).toEqual({ kind: 'open' });
    expect(
      pageStateOf(
        viewFixture({
          status: 'accepted',
          answer: { kind: 'accepted', at: '2026-03-05T16:00:00.000Z', cancellationEndsAt: null },
        }),
      ),
    ).toEqual({ kind: 'accepted', at: '2026-03-05T16:00:00.000Z', cancellationEndsAt: null });
    expect(
      pageStateOf(
        viewFixture({
          status: 'declined',
          answer: { kind: 'declined', at: '2026-03-05T16:00:00.000Z', cancellationEndsAt: null },
        }),
      ),
    ).toEqual({ kind: 'declined', at: '2026-03-05T16:00:00.000Z' });
    expect(pageStateOf(viewFixture({ status: 'superseded' }))).toEqual({ kind: 'replaced' });
  });
});

describe('deadLinkOf', () => {
  const problem = (status: number) =>
    new ApiError({ status, code: ErrorCode.NotFound, title: 'x', detail: 'x' });
  it('names 404, 410 and 409 in words and leaves other failures alone', () => {
    expect(deadLinkOf(problem(404))).toBe('unknown');
    expect(deadLinkOf(problem(410))).toBe('expired');
    expect(deadLinkOf(problem(409))).toBe('answered');
    expect(deadLinkOf(problem(400))).toBeNull();
    expect(deadLinkOf(new Error('offline'))).toBeNull();
  });
});
