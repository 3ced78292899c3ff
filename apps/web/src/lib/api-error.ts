import { ErrorCode, type FieldError, type ProblemDetails } from '@seamwright/shared';

/** An API answer that was not 2xx, carrying what the problem+json body said. */
export class ApiError extends Error {
  readonly status: number;
  readonly code: ErrorCode;
  readonly detail: string;
  readonly fieldErrors: FieldError[];
  readonly requestId: string | undefined;

  constructor(
    problem: Pick<ProblemDetails, 'status' | 'code' | 'title'> & Partial<ProblemDetails>,
  ) {
    super(problem.detail ?? problem.title);
    this.name = 'ApiError';
    this.status = problem.status;
    this.code = problem.code;
    this.detail = problem.detail ?? problem.title;
    this.fieldErrors = problem.errors ?? [];
    this.requestId = problem.requestId;
  }

  /** The first message for a field path (`email`, `sites.0.city`), if the server sent one. */
  fieldMessage(path: string): string | undefined {
    return this.fieldErrors.find((e) => e.path === path)?.message;
  }
}

const knownCodes = new Set<string>(Object.values(ErrorCode));

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null;
}

function readFieldErrors(value: unknown): FieldError[] {
  if (!Array.isArray(value)) return [];
  return value.flatMap((item): FieldError[] =>
    isRecord(item) && typeof item.path === 'string' && typeof item.message === 'string'
      ? [{ path: item.path, message: item.message }]
      : [],
  );
}

function codeForStatus(status: number): ErrorCode {
  if (status === 401) return ErrorCode.Unauthenticated;
  if (status === 403) return ErrorCode.Forbidden;
  if (status === 404) return ErrorCode.NotFound;
  if (status === 409) return ErrorCode.Conflict;
  if (status === 413) return ErrorCode.PayloadTooLarge;
  if (status === 422) return ErrorCode.Unprocessable;
  if (status === 429) return ErrorCode.RateLimited;
  if (status === 400) return ErrorCode.ValidationFailed;
  return ErrorCode.Internal;
}

/**
 * Turns a failed response into an ApiError. Bodies that are not problem+json (a proxy's HTML
 * page, an empty 502) still give an error with a code derived from the status.
 */
export async function toApiError(response: Response): Promise<ApiError> {
  let body: unknown = null;
  const type = response.headers.get('content-type') ?? '';
  if (type.includes('json')) {
    body = await response.json().catch(() => null);
  }
  const problem = isRecord(body) ? body : {};
  const code =
    typeof problem.code === 'string' && knownCodes.has(problem.code)
      ? (problem.code as ErrorCode)
      : codeForStatus(response.status);
  const title = typeof problem.title === 'string' ? problem.title : fallbackTitle(response.status);
  return new ApiError({
    status: response.status,
    code,
    title,
    detail: typeof problem.detail === 'string' ? problem.detail : title,
    errors: readFieldErrors(problem.errors),
    requestId: typeof problem.requestId === 'string' ? problem.requestId : undefined,
  });
}

function fallbackTitle(status: number): string {
  if (status >= 500) return 'Something went wrong on our side. Please try again in a moment.';
  if (status === 404) return 'We could not find that.';
  if (status === 403) return 'This is not available for your role.';
  return 'The request could not be completed.';
}

/** A network failure (offline, server down) as an ApiError so callers handle one type. */
export function networkError(): ApiError {
  return new ApiError({
    status: 0,
    code: ErrorCode.Internal,
    title: 'Could not reach Seamwright. Check your connection and try again.',
  });
}
