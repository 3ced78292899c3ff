// The reports page's filters, kept in the URL: the period (`from`, `to`, calendar days) and a
// crew. Anything that is not a calendar day or a crew id is dropped (the server's defaults).
const isoDay = /^\d{4}-\d{2}-\d{2}$/;
const uuid = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export interface ReportParams {
  /** Unused: useUrlListParams keeps a page for lists; the reports have none. */
  page: number;
  from: string | null;
  to: string | null;
  crewId: string | null;
}

export function parseReportParams(search: URLSearchParams): ReportParams {
  const day = (key: string) => {
    const value = search.get(key);
    return value && isoDay.test(value) ? value : null;
  };
  const crew = search.get('crewId');
  return {
    page: 1,
    from: day('from'),
    to: day('to'),
    crewId: crew && uuid.test(crew) ? crew : null,
  };
}

export function reportSearch(params: ReportParams): URLSearchParams {
  const search = new URLSearchParams();
  if (params.from) search.set('from', params.from);
  if (params.to) search.set('to', params.to);
  if (params.crewId) search.set('crewId', params.crewId);
  return search;
}

/** The query string the API takes for the same period (and crew, for the dashboard). */
export function periodQuery(params: ReportParams, withCrew: boolean): string {
  const search = reportSearch({ ...params, crewId: withCrew ? params.crewId : null });
  const text = search.toString();
  return text ? `?${text}` : '';
}
