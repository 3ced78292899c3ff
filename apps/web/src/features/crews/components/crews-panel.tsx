import { useState } from 'react';
import { crewColours, weekdayShortNamesOf } from './crew-words';
import type { CrewView } from '@seamwright/shared';
import { Button } from '../../../components/ui/button';
import { FormAlert, FormNotice } from '../../../components/ui/form-alert';
import { Loading } from '../../../components/ui/loading';
import { useCan } from '../../../lib/session';
import { useCrews, useDeleteCrew, useRestoreCrew } from '../api/crews-api';
import { CrewForm } from './crew-form';

function CrewCard({ crew, onEdit }: { crew: CrewView; onEdit: () => void }) {
  const canManage = useCan('crews.manage');
  const remove = useDeleteCrew();
  const restore = useRestoreCrew();
  const [said, setSaid] = useState<string | null>(null);
  return (
    <li className="flex flex-col gap-2 rounded-lg border border-line bg-white p-4">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h3 className="flex items-center gap-2 text-lg font-bold">
          <span
            aria-hidden
            className="inline-block h-5 w-5 rounded"
            style={{ backgroundColor: crew.colourHex }}
          />
          {crew.name}
          {crew.archived ? <span className="text-sm text-ink-muted">(archived)</span> : null}
        </h3>
        {canManage ? (
          <div className="flex gap-2">
            <Button variant="secondary" onClick={onEdit} aria-label={`Edit ${crew.name}`}>
              Edit
            </Button>
            {crew.archived ? (
              <Button variant="quiet" onClick={() => restore.mutate(crew.id)}>
                Restore
              </Button>
            ) : (
              <Button
                variant="quietDanger"
                isBusy={remove.isPending}
                onClick={() =>
                  remove.mutate(crew.id, { onSuccess: (result) => setSaid(result.message) })
                }
                aria-label={`Remove ${crew.name}`}
              >
                Remove
              </Button>
            )}
          </div>
        ) : null}
      </div>
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
        <dt className="text-ink-muted">Colour</dt>
        <dd>{crewColours.find((c) => c.key === crew.colour)?.label ?? crew.colour}</dd>
        <dt className="text-ink-muted">Works</dt>
        <dd>{weekdayShortNamesOf(crew.workingDays)}</dd>
        <dt className="text-ink-muted">Jobs a day</dt>
        <dd className="tabular-nums">{crew.jobsPerDay}</dd>
        <dt className="text-ink-muted">People</dt>
        <dd>
          {crew.members.length === 0
            ? 'Nobody yet'
            : crew.members.map((m) => `${m.name}${m.kind === 'lead' ? ' (lead)' : ''}`).join(', ')}
        </dd>
      </dl>
      <FormNotice>{said}</FormNotice>
      {remove.error ? <FormAlert>{remove.error.message}</FormAlert> : null}
    </li>
  );
}

/** The company's crews with their colours, days, capacity and people; add and edit here. */
export function CrewsPanel() {
  const crews = useCrews();
  const canManage = useCan('crews.manage');
  const [editing, setEditing] = useState<CrewView | 'new' | null>(null);
  if (crews.isPending) return <Loading />;
  if (crews.error) return <FormAlert>{crews.error.message}</FormAlert>;
  const used = new Set(crews.data.map((c) => c.colour));
  const suggested = crewColours.find((c) => !used.has(c.key))?.key ?? crewColours[0].key;
  return (
    <div className="flex flex-col gap-4">
      {canManage && editing === null ? (
        <div>
          <Button onClick={() => setEditing('new')}>New crew</Button>
        </div>
      ) : null}
      {editing !== null ? (
        <div className="rounded-lg border border-line bg-sand-50 p-6">
          <CrewForm
            key={editing === 'new' ? 'new' : editing.id}
            crew={editing === 'new' ? null : editing}
            suggestedColour={suggested}
            onDone={() => setEditing(null)}
          />
        </div>
      ) : null}
      {crews.data.length === 0 ? (
        <p className="text-ink-muted">No crews yet. Add the first to book it on the calendar.</p>
      ) : (
        <ul className="flex flex-col gap-3">
          {crews.data.map((crew) => (
            <CrewCard key={crew.id} crew={crew} onEdit={() => setEditing(crew)} />
          ))}
        </ul>
      )}
    </div>
  );
}
