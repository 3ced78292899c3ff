// The stock forms' schemas. Lengths are held in feet, but the messages name limits through the
// company's units (`1,000' 0"` or `304.8 m`), never as raw feet.
import { z } from 'zod';
import { dyeLotSchema, optionalText } from '@seamwright/shared';
import type { Units } from '../../../lib/units';

/** A length box: null while empty or unreadable (LengthField), a positive length when sent. */
export function lengthSchema(units: Units, missing: string) {
  return z
    .number()
    .nullable()
    .pipe(
      z
        .number({ error: missing })
        .positive('Must be more than 0')
        .max(1000, `At most ${units.length(1000)}`),
    );
}

const receivedOn = z
  .union([z.literal(''), z.iso.date('Use a date like 2026-03-14')])
  .transform((value) => value || null);

export function deliveryFormSchema(units: Units) {
  return z.object({
    turfProductId: z.string().min(1, 'Choose the turf product'),
    dyeLot: dyeLotSchema,
    location: optionalText(120),
    receivedOn,
    rolls: z
      .array(
        z.object({
          // A select's value is text; the widths on offer are the product's own.
          widthFt: z.coerce.number<string | number>().positive('Choose the width'),
          lengthFt: lengthSchema(units, 'Type the length of this roll'),
        }),
      )
      .min(1, 'List at least one roll')
      .max(50, 'At most 50 rolls in one delivery'),
  });
}
export type DeliveryFormSchema = ReturnType<typeof deliveryFormSchema>;

export function rollFormSchema(units: Units) {
  return z.object({
    dyeLot: dyeLotSchema,
    location: optionalText(120),
    remainingFt: z
      .number()
      .nullable()
      .pipe(
        z
          .number({ error: 'Type the length left on the roll' })
          .min(0, 'Cannot be less than nothing')
          .max(1000, `At most ${units.length(1000)}`),
      ),
    notes: optionalText(500),
    archived: z.boolean(),
  });
}
export type RollFormSchema = ReturnType<typeof rollFormSchema>;

export function remnantsFormSchema(units: Units) {
  return z.object({
    remnants: z
      .array(
        z.object({
          rollId: z.string().min(1, 'Choose the roll it was cut from'),
          lengthFt: lengthSchema(units, 'Type the length of the piece'),
        }),
      )
      .min(1, 'List at least one remnant')
      .max(50),
  });
}
export type RemnantsFormSchema = ReturnType<typeof remnantsFormSchema>;
