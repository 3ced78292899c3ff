// The crew form's own schema: checkboxes give strings, helpers are typed one per line; the
// submit turns it into the API's body (createCrewInputSchema checks it again on the server).
import { weekdayShortNames } from '@seamwright/domain';
import { crewColourKeys } from '@seamwright/shared';
import type { CreateCrewInput, CrewView } from '@seamwright/shared';
import { z } from 'zod';

export const weekdayOptions = [1, 2, 3, 4, 5, 6, 0].map((day) => ({
  value: String(day),
  label: weekdayShortNames[day] ?? String(day),
}));

export const crewFormSchema = z.object({
  name: z.string().trim().min(1, 'Crew name is required').max(60, 'At most 60 characters'),
  colour: z.enum(crewColourKeys, { error: 'Choose a colour' }),
  workingDays: z.array(z.string()).min(1, 'Choose at least one working day'),
  jobsPerDay: z.coerce
    .number<string>({ error: 'Jobs per day is a whole number' })
    .int('Jobs per day is a whole number')
    .min(1, 'At least one job a day')
    .max(5, 'At most 5 jobs a day'),
  leadIds: z.array(z.string()),
  helpers: z.string().max(2000),
});
export type CrewFormInput = z.input<typeof crewFormSchema>;
export type CrewFormValues = z.output<typeof crewFormSchema>;

export function crewFormDefaults(crew: CrewView | null, colour: string): CrewFormInput {
  return {
    name: crew?.name ?? '',
    colour: (crew?.colour ?? colour) as CrewFormInput['colour'],
    workingDays: (crew?.workingDays ?? [1, 2, 3, 4, 5]).map(String),
    jobsPerDay: String(crew?.jobsPerDay ?? 1),
    leadIds: crew?.members.flatMap((m) => (m.userId ? [m.userId] : [])) ?? [],
    helpers: crew?.members.flatMap((m) => (m.userId ? [] : [m.name])).join('\n') ?? '',
  };
}

export function toCrewBody(values: CrewFormValues): CreateCrewInput {
  const helpers = values.helpers
    .split('\n')
    .map((line) => line.trim())
    .filter(Boolean);
  return {
    name: values.name,
    colour: values.colour,
    workingDays: values.workingDays.map(Number),
    jobsPerDay: values.jobsPerDay,
    members: [
      ...values.leadIds.map((userId) => ({ userId })),
      ...helpers.map((name) => ({ name })),
    ],
  };
}
