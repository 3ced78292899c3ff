// Crews: who goes out together (crew-lead members and named helpers without an account), their
// colour on the calendar, their working days and how many jobs a day they take. No money.
import { z } from 'zod';
import { crewColourKeys } from './crew-colours.js';
import type { CrewColour } from './crew-colours.js';
import { requiredText } from './text.js';

const uuid = (label: string) =>
  z.uuid(`${label} must be an id`).transform((value) => value.toLowerCase());

/** 0 = Sunday … 6 = Saturday, as JavaScript and ISO-less calendars count them. */
const workingDaysSchema = z
  .array(z.number().int().min(0).max(6), { error: 'Working days are numbers 0 (Sun) to 6 (Sat)' })
  .min(1, 'Choose at least one working day')
  .max(7)
  .transform((days) => [...new Set(days)].sort((a, b) => a - b));

export const crewMemberInputSchema = z.union([
  z.object({ userId: uuid('Member') }).strict(),
  z.object({ name: requiredText('Helper name', 80) }).strict(),
]);
export type CrewMemberInput = z.input<typeof crewMemberInputSchema>;

const crewFields = {
  name: requiredText('Crew name', 60),
  colour: z.enum(crewColourKeys, { error: 'Choose one of the crew colours' }),
  workingDays: workingDaysSchema,
  jobsPerDay: z
    .number({ error: 'Jobs per day is a whole number' })
    .int('Jobs per day is a whole number')
    .min(1, 'A crew takes at least one job a day')
    .max(5, 'At most 5 jobs a day'),
  /** The whole list: members not named are taken off the crew. */
  members: z.array(crewMemberInputSchema).max(20, 'At most 20 people on a crew'),
};

export const createCrewInputSchema = z.object({
  name: crewFields.name,
  colour: crewFields.colour,
  workingDays: crewFields.workingDays.default([1, 2, 3, 4, 5]),
  jobsPerDay: crewFields.jobsPerDay.default(1),
  members: crewFields.members.default([]),
});
export type CreateCrewInput = z.input<typeof createCrewInputSchema>;
export type CreateCrewData = z.output<typeof createCrewInputSchema>;

export const updateCrewInputSchema = z
  .object({ ...crewFields, archived: z.boolean() })
  .partial()
  .refine((value) => Object.keys(value).length > 0, { message: 'Nothing to change' });
export type UpdateCrewInput = z.input<typeof updateCrewInputSchema>;
export type UpdateCrewData = z.output<typeof updateCrewInputSchema>;

export const crewListQuerySchema = z.object({
  includeArchived: z
    .enum(['true', 'false'])
    .default('false')
    .transform((value) => value === 'true'),
});

export interface CrewMemberView {
  id: string;
  /** The member's account for a crew lead; null for a named helper. */
  userId: string | null;
  name: string;
  kind: 'lead' | 'helper';
}

export interface CrewView {
  id: string;
  name: string;
  colour: CrewColour;
  /** The colour's hex value, for the calendar. */
  colourHex: string;
  workingDays: number[];
  jobsPerDay: number;
  members: CrewMemberView[];
  archived: boolean;
  createdAt: string;
  updatedAt: string;
}

/** What DELETE did: a crew with bookings is archived (kept for history), one without is gone. */
export interface CrewDeletion {
  id: string;
  outcome: 'deleted' | 'archived';
  message: string;
}
