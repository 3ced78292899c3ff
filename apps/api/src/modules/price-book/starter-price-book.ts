// What a new company starts with, so its first estimate already has totals. Every price here
// is INVENTED demo data (no supplier's list was consulted); each row is marked `isStarter` and
// the screen says "starter price — replace with yours".
import type { PriceBookItemData } from '@seamwright/shared';
import { standardEstimatingSettings } from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import type { Tx } from '../../db/sequelize.js';
import { createEstimatingSettingsRow } from '../estimating-settings/estimating-settings.repository.js';
import { createPriceBookItem } from './price-book.repository.js';

/** $ → millicents, for writing invented figures legibly. */
const usd = (dollars: number) => Math.round(dollars * 100_000);
const starter = { isStarter: true, packSize: null } as const;

export const starterPriceBook: PriceBookItemData[] = [
  {
    ...starter,
    kind: 'turf',
    key: 'turf-landscape-175',
    name: 'Landscape turf 1¾ in (starter)',
    unit: 'sq ft',
    priceMillicents: usd(2.4),
    attributes: {
      pileHeightIn: 1.75,
      rollWidthsFt: [15, 12],
      maxRollLengthFt: 100,
      recommendedInfill: 'Silica sand 16/30',
      infillRateLbPerSqFt: 1.5,
    },
  },
  {
    ...starter,
    kind: 'turf',
    key: 'turf-pet-125',
    name: 'Pet turf 1¼ in (starter)',
    unit: 'sq ft',
    priceMillicents: usd(2.85),
    attributes: {
      pileHeightIn: 1.25,
      rollWidthsFt: [15],
      maxRollLengthFt: 100,
      recommendedInfill: 'Zeolite + coated sand',
      infillRateLbPerSqFt: 2.5,
    },
  },
  {
    ...starter,
    kind: 'material',
    key: 'base-stone',
    name: 'Crushed base stone',
    unit: 'ton',
    priceMillicents: usd(38),
  },
  {
    ...starter,
    kind: 'material',
    key: 'silica-sand-50',
    name: 'Silica sand 16/30',
    unit: 'bag',
    packSize: 50,
    priceMillicents: usd(9.5),
  },
  {
    ...starter,
    kind: 'material',
    key: 'zeolite-50',
    name: 'Zeolite',
    unit: 'bag',
    packSize: 50,
    priceMillicents: usd(24),
  },
  {
    ...starter,
    kind: 'material',
    key: 'seam-tape-100',
    name: 'Seam tape 12 in',
    unit: 'roll',
    packSize: 100,
    priceMillicents: usd(45),
  },
  {
    ...starter,
    kind: 'material',
    key: 'seam-adhesive-1gal',
    name: 'Seam adhesive',
    unit: 'gal',
    packSize: 1,
    priceMillicents: usd(42),
  },
  {
    ...starter,
    kind: 'material',
    key: 'nails-6in-50',
    name: '6 in landscape nails (50)',
    unit: 'box',
    packSize: 50,
    priceMillicents: usd(14),
  },
  {
    ...starter,
    kind: 'material',
    key: 'bender-board-20',
    name: 'Bender board 20 ft',
    unit: 'board',
    packSize: 20,
    priceMillicents: usd(18),
  },
  {
    ...starter,
    kind: 'labour',
    key: 'labour-install',
    name: 'Install labour',
    unit: 'sq ft',
    priceMillicents: usd(1.25),
    attributes: { basis: 'per_sq_ft' },
  },
  {
    ...starter,
    kind: 'labour',
    key: 'labour-seams',
    name: 'Seaming labour',
    unit: 'seam ft',
    priceMillicents: usd(1.5),
    attributes: { basis: 'per_seam_ft' },
  },
  {
    ...starter,
    kind: 'labour',
    key: 'labour-hour',
    name: 'Crew hour',
    unit: 'hour',
    priceMillicents: usd(65),
    attributes: { basis: 'per_hour' },
  },
  {
    ...starter,
    kind: 'equipment',
    key: 'sod-cutter',
    name: 'Sod cutter rental',
    unit: 'day',
    priceMillicents: usd(110),
    attributes: {},
  },
  {
    ...starter,
    kind: 'equipment',
    key: 'plate-compactor',
    name: 'Plate compactor rental',
    unit: 'day',
    priceMillicents: usd(95),
    attributes: {},
  },
  {
    ...starter,
    kind: 'disposal',
    key: 'roll-off-10',
    name: 'Roll-off box 10 cu yd',
    unit: 'load',
    priceMillicents: usd(425),
    attributes: {},
  },
].map((item) => ({ attributes: {}, ...item }) as PriceBookItemData);

/** Writes the starter price book and the standard estimating settings for a new company. */
export async function createStarterEstimating(ctx: RequestContext, tx: Tx): Promise<void> {
  for (const item of starterPriceBook) await createPriceBookItem(ctx, item, tx);
  await createEstimatingSettingsRow(
    ctx,
    { ...standardEstimatingSettings, takeoffOverrides: {} },
    tx,
  );
}
