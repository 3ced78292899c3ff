import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import type { RollView } from '@seamwright/shared';
import { paths } from '../../../config/paths';
import { useCan } from '../../../lib/session';
import { useUnits } from '../../../lib/units';
import { formatDay, kindLabel } from '../utils/roll-words';
import { RollCautions } from './roll-cautions';

function Item({ term, children }: { term: string; children: ReactNode }) {
  return (
    <div>
      <dt className="text-sm text-ink-muted">{term}</dt>
      <dd className="font-semibold tabular-nums">{children}</dd>
    </div>
  );
}

/** What the stock records of one roll or remnant, lengths in the company's units. */
export function RollDetails({ roll }: { roll: RollView }) {
  const units = useUnits();
  // Crew leads do not open job pages yet (jobs.read), so they get no link there.
  const canOpenJob = useCan('jobs.read');
  return (
    <section aria-labelledby="roll-facts" className="flex flex-col gap-4">
      <h2 id="roll-facts" className="sr-only">
        The roll
      </h2>
      <dl className="grid grid-cols-2 gap-4 rounded-lg border border-line bg-white p-4 sm:grid-cols-4">
        <Item term="Dye lot">{roll.dyeLot}</Item>
        <Item term="Roll or remnant">{kindLabel(roll)}</Item>
        <Item term="Width">{units.length(roll.widthFt)}</Item>
        <Item term={roll.isRemnant ? 'Length when cut' : 'Length received'}>
          {units.length(roll.lengthFt)}
        </Item>
        <Item term="Length left">{units.length(roll.remainingFt)}</Item>
        <Item term="Held by jobs">{roll.heldFt > 0 ? units.length(roll.heldFt) : 'Nothing'}</Item>
        <Item term="Free">{units.length(roll.availableFt)}</Item>
        <Item term="Location">{roll.location ?? 'Not recorded'}</Item>
        <Item term="Received">{roll.receivedOn ? formatDay(roll.receivedOn) : 'Not recorded'}</Item>
        <Item term="Status">
          {roll.archived ? 'Archived' : roll.remainingFt > 0 ? 'In stock' : 'Used up'}
        </Item>
        {roll.sourceJobId && canOpenJob ? (
          <Item term="Left from">
            <Link to={paths.job(roll.sourceJobId)}>The job it was cut for</Link>
          </Item>
        ) : null}
        {roll.notes ? (
          <div className="col-span-2 sm:col-span-4">
            <dt className="text-sm text-ink-muted">Notes</dt>
            <dd className="whitespace-pre-line">{roll.notes}</dd>
          </div>
        ) : null}
      </dl>
      {roll.archived ? null : (
        <RollCautions rolls={[{ widthFt: roll.widthFt, lengthFt: roll.remainingFt }]} />
      )}
    </section>
  );
}
