/** Every areas query key; a key holds every input of its fetcher. */
export const areaKeys = {
  all: ['areas'] as const,
  /** Everything read for one job: its areas and its takeoff. */
  ofJob: (jobId: string) => [...areaKeys.all, 'job', jobId] as const,
  jobList: (jobId: string) => [...areaKeys.ofJob(jobId), 'list'] as const,
  jobTakeoff: (jobId: string) => [...areaKeys.ofJob(jobId), 'takeoff'] as const,
  details: () => [...areaKeys.all, 'detail'] as const,
  detail: (id: string) => [...areaKeys.details(), id] as const,
  /** The price book's turf items the area form offers. */
  turfProducts: () => [...areaKeys.all, 'turf-products'] as const,
};
