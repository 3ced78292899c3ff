import { jobStatuses, type JobStatus } from '@seamwright/shared';
import { TextField } from '../../../components/ui/form-fields';
import { SearchBox } from '../../../components/ui/search-box';
import type { JobListParams } from '../utils/list-params';
import { toggleStatus } from '../utils/list-params';
import { statusLabel } from './job-status';

interface JobFiltersProps {
  params: JobListParams;
  onChange: (change: Partial<JobListParams>) => void;
}

/** Search, status checkboxes and the created-date range of the jobs list. */
export function JobFilters({ params, onChange }: JobFiltersProps) {
  return (
    <div className="mb-4 flex flex-col gap-4 print:hidden">
      <div className="flex flex-wrap items-end gap-4">
        <SearchBox
          label="Search jobs"
          value={params.q}
          onSearch={(q) => onChange({ q })}
          placeholder="Title, customer or address"
        />
        <TextField
          label="Added from"
          type="date"
          value={params.from}
          max={params.to || undefined}
          onChange={(event) => onChange({ from: event.target.value })}
          wrapperClassName="w-44"
        />
        <TextField
          label="Added to"
          type="date"
          value={params.to}
          min={params.from || undefined}
          onChange={(event) => onChange({ to: event.target.value })}
          wrapperClassName="w-44"
        />
      </div>
      <fieldset>
        <legend className="mb-1 font-semibold">Status</legend>
        <div className="flex flex-wrap gap-x-4 gap-y-1">
          {jobStatuses.map((status: JobStatus) => (
            <label key={status} className="flex min-h-11 items-center gap-2">
              <input
                type="checkbox"
                className="h-5 w-5 accent-moss-700"
                checked={params.status.includes(status)}
                onChange={() => onChange({ status: toggleStatus(params.status, status) })}
              />
              {statusLabel(status)}
            </label>
          ))}
        </div>
      </fieldset>
    </div>
  );
}
