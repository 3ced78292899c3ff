import { useQuery } from '@tanstack/react-query';
import { crewColours } from '@seamwright/shared';
import type { CrewView, ListResponse, MemberView } from '@seamwright/shared';
import { Button } from '../../../components/ui/button';
import { Form, SubmitButton, TextAreaField, TextField } from '../../../components/ui/form';
import { api } from '../../../lib/api-client';
import { useCan } from '../../../lib/session';
import { useSaveCrew } from '../api/crews-api';
import { ChoiceGroup } from './choice-group';
import { crewFormDefaults, crewFormSchema, toCrewBody, weekdayOptions } from './crew-form-schema';

/** The company's crew leads, to put on a crew (the member list is the owner's to read). */
function useCrewLeads(enabled: boolean) {
  return useQuery({
    queryKey: ['crews', 'leads'],
    enabled,
    queryFn: ({ signal }) =>
      api.get<ListResponse<MemberView>>('/members', { query: { pageSize: 100 }, signal }),
    select: (body) => body.data.filter((m) => m.role === 'crew_lead'),
  });
}

export function CrewForm({
  crew,
  suggestedColour,
  onDone,
}: {
  crew: CrewView | null;
  suggestedColour: string;
  onDone: () => void;
}) {
  const save = useSaveCrew(crew?.id ?? null);
  const canReadMembers = useCan('members.read');
  const leads = useCrewLeads(canReadMembers);
  // People already on the crew stay pickable even when the member list cannot be read.
  const leadOptions = new Map<string, string>();
  for (const m of crew?.members ?? []) if (m.userId) leadOptions.set(m.userId, m.name);
  for (const m of leads.data ?? []) leadOptions.set(m.userId, m.name);

  return (
    <Form
      schema={crewFormSchema}
      defaultValues={crewFormDefaults(crew, suggestedColour)}
      onSubmit={async (values) => {
        await save.mutateAsync(toCrewBody(values));
        onDone();
      }}
      className="flex flex-col gap-4"
    >
      <h3 tabIndex={-1} className="text-lg font-bold">
        {crew ? `Edit ${crew.name}` : 'New crew'}
      </h3>
      <TextField name="name" label="Crew name" autoComplete="off" />
      <ChoiceGroup
        name="colour"
        legend="Colour on the calendar"
        type="radio"
        options={crewColours.map((c) => ({ value: c.key, label: c.label, swatch: c.hex }))}
        hint="Every colour carries white text clearly; the crew's name is always shown too."
      />
      <ChoiceGroup
        name="workingDays"
        legend="Working days"
        type="checkbox"
        options={weekdayOptions}
      />
      <TextField
        name="jobsPerDay"
        label="Jobs a day"
        type="number"
        min={1}
        max={5}
        inputMode="numeric"
        hint="How many jobs the crew can take on one day; more is refused on the calendar."
      />
      {leadOptions.size > 0 ? (
        <ChoiceGroup
          name="leadIds"
          legend="Crew leads"
          type="checkbox"
          options={[...leadOptions].map(([value, label]) => ({ value, label }))}
          hint="Crew leads see this crew's bookings."
        />
      ) : null}
      <TextAreaField
        name="helpers"
        label="Helpers"
        hint="One name a line, for people without an account."
      />
      <div className="flex flex-wrap gap-2">
        <SubmitButton>{crew ? 'Save crew' : 'Add crew'}</SubmitButton>
        <Button variant="secondary" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </Form>
  );
}
