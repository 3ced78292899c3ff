import { describe, expect, it } from 'vitest';
import { cancellationNotice, longCalendarDate } from './notice.js';

describe('cancellationNotice', () => {
  const notice = cancellationNotice({
    sellerName: 'Prairie Turf Co.',
    sellerAddress: '12 Mill Road\nLoveland, CO 80537',
    saleDate: '2025-06-06',
    lastDay: '2025-06-10',
    businessDays: 3,
  });

  it('states the period and the last day in words', () => {
    expect(notice.statement).toContain('midnight of the third business day');
    expect(notice.paragraphs[0]).toBe('Date of the transaction: Friday, June 6, 2025.');
    expect(notice.paragraphs[1]).toContain('within three business days');
    expect(notice.paragraphs.at(-1)).toBe(
      'To cancel this transaction, mail or deliver a signed and dated copy of this cancellation notice, or any other written notice, to Prairie Turf Co. at 12 Mill Road, Loveland, CO 80537, not later than midnight of Tuesday, June 10, 2025.',
    );
  });

  it('says where to send it when the company has no address on file', () => {
    const bare = cancellationNotice({
      sellerName: 'A',
      sellerAddress: null,
      saleDate: '2025-06-06',
      lastDay: '2025-06-10',
      businessDays: 5,
    });
    expect(bare.paragraphs.at(-1)).toContain('to A at its place of business');
    expect(bare.statement).toContain('fifth business day');
  });

  it('writes days in full', () => {
    expect(longCalendarDate('2025-10-16')).toBe('Thursday, October 16, 2025');
  });
});
