import { bookingPhaseLabels, bookingPhases } from '@seamwright/shared';
import type { BookingSaved, BookingView, CrewView } from '@seamwright/shared';
import { z } from 'zod';
import { Button } from '../../../components/ui/button';
import { Form, SelectField, SubmitButton, TextField } from '../../../components/ui/form';
import { useBookableJobs, useCreateBooking, useUpdateBooking } from '../api/bookings-api';

const day = z.iso.date({ error: 'Use a date like 2026-03-14' });
const bookingFormSchema = z
  .object({
    crewId: z.string().min(1, 'Choose a crew'),
    jobId: z.string().min(1, 'Choose a job'),
    phase: z.enum(bookingPhases, { error: 'Choose a phase' }),
    startDate: day,
    endDate: day,
  })
  .refine((v) => v.endDate >= v.startDate, {
    message: 'The last day cannot be before the first day',
    path: ['endDate'],
  });

/**
 * Books a crew on a job for some days, or changes a booking (its job stays). The keyboard path
 * to everything dragging does; the server's refusal lands beside the day it is about.
 */
export function BookingForm({
  crews,
  booking,
  days,
  defaultCrewId,
  onDone,
}: {
  crews: CrewView[];
  booking: BookingView | null;
  days: { startDate: string; endDate: string };
  defaultCrewId: string;
  onDone: (saved: BookingSaved | null) => void;
}) {
  const jobs = useBookableJobs(booking === null);
  const create = useCreateBooking();
  const update = useUpdateBooking();
  return (
    <Form
      schema={bookingFormSchema}
      defaultValues={{
        crewId: booking?.crewId ?? defaultCrewId,
        jobId: booking?.jobId ?? '',
        phase: booking?.phase ?? 'tear_out_base',
        ...days,
      }}
      onSubmit={async (values) => {
        const saved = booking
          ? await update.mutateAsync({
              id: booking.id,
              version: booking.version,
              crewId: values.crewId,
              phase: values.phase,
              startDate: values.startDate,
              endDate: values.endDate,
            })
          : await create.mutateAsync(values);
        onDone(saved);
      }}
      className="flex flex-col gap-4"
      aria-label={booking ? 'Change booking' : 'New booking'}
    >
      <h2 tabIndex={-1} className="text-lg font-bold">
        {booking ? `Change booking: ${booking.job.title}` : 'New booking'}
      </h2>
      <div className="grid gap-4 sm:grid-cols-2">
        <SelectField name="crewId" label="Crew">
          <option value="">Choose a crew</option>
          {crews.map((crew) => (
            <option key={crew.id} value={crew.id}>
              {crew.name}
            </option>
          ))}
        </SelectField>
        {booking ? (
          <p>
            <span className="block font-semibold">Job</span>
            {booking.job.title} ({booking.customerName})
          </p>
        ) : (
          <SelectField name="jobId" label="Job" hint="Accepted and scheduled jobs.">
            <option value="">{jobs.isPending ? 'Loading jobs…' : 'Choose a job'}</option>
            {(jobs.data ?? []).map((job) => (
              <option key={job.id} value={job.id}>
                {job.title} · {job.customer.name}
              </option>
            ))}
          </SelectField>
        )}
        <SelectField name="phase" label="Phase">
          {bookingPhases.map((phase) => (
            <option key={phase} value={phase}>
              {bookingPhaseLabels[phase]}
            </option>
          ))}
        </SelectField>
        <div className="grid grid-cols-2 gap-4">
          <TextField name="startDate" label="First day" type="date" />
          <TextField name="endDate" label="Last day" type="date" />
        </div>
      </div>
      <div className="flex flex-wrap gap-2">
        <SubmitButton busyLabel="Checking…">{booking ? 'Save booking' : 'Book crew'}</SubmitButton>
        <Button variant="secondary" onClick={() => onDone(null)}>
          Cancel
        </Button>
      </div>
    </Form>
  );
}
