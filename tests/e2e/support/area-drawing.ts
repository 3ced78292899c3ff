// Drawing an area in the area editor by typing its sides, as the installer does on site.
import { expect, type Page } from '@playwright/test';

/** Types one side into the editor's "Add a side" form (direction from the list, length as typed). */
export async function addSide(page: Page, direction: string, length: string): Promise<void> {
  const form = page.getByRole('form', { name: 'Add a side to the outline' });
  await form.getByLabel('Direction').selectOption({ label: direction });
  await form.getByLabel('Length (feet)').fill(length);
  await form.getByLabel('Length (feet)').press('Enter');
}

/**
 * The L of tests/fixtures/areas.ts: 40 ft east, 18 north, 15 west, 12 north, 25 west; the
 * closing side runs back south. 40 × 18 + 25 × 12 = 1,020 sq ft (arithmetic). Lengths are
 * typed the ways people write them.
 */
export async function typeLShapedYard(page: Page): Promise<void> {
  await addSide(page, 'East', `40'`);
  await addSide(page, 'North', `18' 0"`);
  await addSide(page, 'West', '15 ft');
  await addSide(page, 'North', `12'`);
  await addSide(page, 'West', `25' 0"`);
  await expect(page.getByTestId('editor-area')).toHaveText('1,020 sq ft');
}
