// The estimate document, parsed back: the company, every line of every tier, the totals as
// dollars, the rounding rule, plans on later pages, and the cancellation notice only when the
// sale is covered (TRADE.md §8.2; the notice's wording comes from @seamwright/domain).
import { afterAll, describe, expect, it } from 'vitest';
import { DocumentPool, sampleEstimateDocumentInput } from '@seamwright/api';
import type { EstimateDocumentInput } from '@seamwright/api';
import { dollars, fold, pdfText } from './pdf-text.js';

const pool = new DocumentPool();
afterAll(async () => {
  await pool.close();
});

function onePage(input: EstimateDocumentInput): EstimateDocumentInput {
  const [first] = input.tiers;
  return { ...input, tiers: first ? [first] : [], areas: [], cautions: [], notes: null };
}

describe('the estimate document', () => {
  it('prints the company, every line of both tiers, the totals and the rounding rule', async () => {
    const input = sampleEstimateDocumentInput();
    expect(input.tiers).toHaveLength(2);
    const pdf = await pool.render(input);
    expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    const { text } = await pdfText(pdf);
    expect(text).toContain(input.company.name);
    expect(text).toContain(input.customer.name);
    expect(text).toContain(input.estimate.number);
    for (const tier of input.tiers) {
      expect(text).toContain(tier.name);
      for (const line of tier.lines) {
        expect(text).toContain(line.label);
        expect(text).toContain(dollars(line.amountCents));
      }
      for (const cents of [tier.subtotalCents, tier.taxCents, tier.totalCents, tier.depositCents])
        expect(text).toContain(dollars(cents));
    }
    // The sample's own figures, worked by hand: 17,098.16 + 8.25 % (1,410.598 → 1,410.60).
    expect(text).toContain('Total $18,508.76');
    expect(text).toContain(fold(input.roundingRule));
    expect(text).toContain('valid until April 7, 2027');
  });

  it('prints the cancellation notice only when one is given', async () => {
    const covered = sampleEstimateDocumentInput({ cancellation: true, areas: false });
    const notice = covered.cancellationNotice;
    expect(notice).toBeTruthy();
    const withNotice = await pdfText(await pool.render(covered));
    expect(withNotice.text).toContain('Notice of cancellation');
    expect(withNotice.text).toContain(notice?.endsOnText);
    // The notice has a page of its own, the last one.
    expect(withNotice.pages.at(-1)).toContain('Notice of cancellation');
    expect(withNotice.pages.at(-1)).toContain('I hereby cancel this transaction.');

    const without = await pdfText(await pool.render(sampleEstimateDocumentInput({ areas: false })));
    expect(without.text).not.toContain('Notice of cancellation');
    expect(without.text).not.toContain('I hereby cancel');
    expect(without.pages.length).toBe(withNotice.pages.length - 1);
  });

  it('draws the plans on pages after the first', async () => {
    const plain = onePage(sampleEstimateDocumentInput());
    const alone = await pdfText(await pool.render(plain));
    expect(alone.pages).toHaveLength(1);

    const withAreas = onePage(sampleEstimateDocumentInput());
    withAreas.areas = sampleEstimateDocumentInput().areas;
    const planned = await pdfText(await pool.render(withAreas));
    expect(planned.pages.length).toBeGreaterThan(1);
    expect(planned.pages[0]).not.toContain('Plan: Back yard');
    expect(planned.pages.slice(1).join(' ')).toContain('Plan: Back yard');
    expect(planned.text).toContain('Plan: Front yard');
    // Side lengths in feet and inches (the back yard is 46 × 34 ft with a 22 × 16 ft notch).
    expect(planned.text).toContain(`46' 0"`);
    expect(planned.text).toContain(`Piece 1: 15' 0"`);
  });

  it('prints lengths in metres for a metric company', async () => {
    const input = { ...sampleEstimateDocumentInput(), units: 'metric' as const };
    const { text } = await pdfText(await pool.render(input));
    // 15 ft = 4.572 m (exact by definition of the foot).
    expect(text).toContain('Piece 1: 4.57 m');
    expect(text).not.toContain(`15' 0"`);
  });

  it('prints each caution with the pointer to local practice', async () => {
    const input = sampleEstimateDocumentInput({ areas: false });
    const { text } = await pdfText(await pool.render(input));
    for (const caution of input.cautions) expect(text).toContain(caution.title);
    expect(text).toContain('Follow local codes and licensing rules');
  });
});
