// The buyer's right to cancel as it applies to one estimate (TRADE.md §8.2): the domain rules
// with the company's time zone and region and the price of the tier the buyer takes.
import {
  addCalendarDays,
  cancellationNotice,
  cancellationPeriod,
  localDateOf,
  longCalendarDate,
} from '@seamwright/domain';
import type { CancellationNotice, CancellationPeriod, SalePlace } from '@seamwright/domain';

export interface SaleCompany {
  name: string;
  address: string | null;
  timeZone: string;
  region: string | null;
}

export function periodOfSale(
  company: SaleCompany,
  sale: { signedAt: Date; place: SalePlace; priceCents: number },
): CancellationPeriod {
  return cancellationPeriod({
    signedAt: sale.signedAt,
    timeZone: company.timeZone,
    region: company.region,
    place: sale.place,
    priceCents: sale.priceCents,
  });
}

/** The notice and its "until midnight of …" sentence, for a covered period; else null. */
export function noticeOfPeriod(
  company: SaleCompany,
  period: CancellationPeriod,
): { notice: CancellationNotice; endsOnText: string } | null {
  if (!period.covered) return null;
  const notice = cancellationNotice({
    sellerName: company.name,
    sellerAddress: company.address,
    saleDate: period.saleDate,
    lastDay: period.lastDay,
    businessDays: period.rule.businessDays,
  });
  return {
    notice,
    endsOnText: `You may cancel until midnight of ${longCalendarDate(period.lastDay)}.`,
  };
}

/** The company's calendar day of `instant`, and that day plus `days`. */
export function localDay(instant: Date, timeZone: string, days = 0): string {
  return addCalendarDays(localDateOf(instant, timeZone), days);
}
