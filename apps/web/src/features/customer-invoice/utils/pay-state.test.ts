import { describe, expect, it } from 'vitest';
import type { PublicInvoiceView } from '@seamwright/shared';
import { ApiError } from '../../../lib/api-error';
import {
  checkoutProblemWords,
  checkoutReturnOf,
  deadInvoiceLinkOf,
  payPanelStateOf,
} from './pay-state';

const view = (balanceCents: number, status: PublicInvoiceView['status'] = 'sent') =>
  ({ balanceCents, status }) as PublicInvoiceView;

describe('the pay panel', () => {
  it('reads only our own return values from the URL', () => {
    expect(checkoutReturnOf(new URLSearchParams('checkout=done'))).toBe('done');
    expect(checkoutReturnOf(new URLSearchParams('checkout=cancelled'))).toBe('cancelled');
    expect(checkoutReturnOf(new URLSearchParams('checkout=paid'))).toBeNull();
  });

  it('never says paid on the return alone: it waits for the balance to move', () => {
    expect(payPanelStateOf(view(5000), 'done', false, 5000)).toEqual({ kind: 'confirming' });
    expect(payPanelStateOf(view(5000), 'done', true, 5000)).toEqual({ kind: 'unconfirmed' });
    expect(payPanelStateOf(view(2000), 'done', false, 5000)).toEqual({
      kind: 'open',
      balanceCents: 2000,
      cancelled: false,
    });
    expect(payPanelStateOf(view(0, 'paid'), 'done', false, 5000)).toEqual({ kind: 'paid' });
  });

  it('offers to pay again after a cancelled or declined payment', () => {
    expect(payPanelStateOf(view(5000), 'cancelled', false, null)).toEqual({
      kind: 'open',
      balanceCents: 5000,
      cancelled: true,
    });
  });

  it('says in words why a payment could not start, and that nothing was charged', () => {
    const down = new ApiError({ status: 503, code: 'SERVICE_BUSY', title: 'x' });
    expect(checkoutProblemWords(down, 'Acme Lawns')).toMatch(/not available.*Nothing was charged/);
    expect(
      deadInvoiceLinkOf(new ApiError({ status: 410, code: 'TOKEN_INVALID', title: 'x' })),
    ).toBe('expired');
  });
});
