import { weekdayShortNames } from '@seamwright/domain';

export { crewColours } from '@seamwright/shared';

/** `Mon, Tue, Wed, Thu, Fri`, Monday first as crews plan their week. */
export function weekdayShortNamesOf(days: readonly number[]): string {
  return [1, 2, 3, 4, 5, 6, 0]
    .filter((day) => days.includes(day))
    .map((day) => weekdayShortNames[day])
    .join(', ');
}
