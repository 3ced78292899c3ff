// Pieces of the API benchmark: signing in over HTTP, one autocannon run, and a sampler of a
// process's resident memory (read from /proc, so Linux only, like the rest of the scripts).
import { readFileSync } from 'node:fs';
import autocannon from 'autocannon';

export interface RouteResult {
  name: string;
  requestsPerSecond: number;
  p50Ms: number;
  p99Ms: number;
  non2xx: number;
  errors: number;
  requests: number;
  /** Statements the database server received per request (its `Questions` counter). */
  statementsPerRequest: number;
  /** CPU time per request of the API process and of MariaDB. */
  apiCpuMs: number;
  dbCpuMs: number;
}

/** What a route's measurement reads before and after: the database and two processes. */
export interface Probe {
  questions(): Promise<number>;
  apiPid: number;
  dbPid: number;
}

function cookieValue(setCookie: string[], name: string): string {
  for (const header of setCookie) {
    const [pair] = header.split(';');
    if (pair?.startsWith(`${name}=`)) return pair.slice(name.length + 1);
  }
  throw new Error(`no ${name} cookie in the answer`);
}

/** What the TLS proxy in front of a production API adds to every request. */
export const behindTlsProxy = { 'x-forwarded-proto': 'https' };
/** The cookie names of an API whose APP_URL is https (config/env.ts). */
const sessionCookie = '__Host-sw.sid';
const csrfCookieName = '__Host-sw.csrf';

/** Signs in through the API as a browser would; returns the Cookie header for later requests. */
export async function signInOverHttp(
  baseUrl: string,
  email: string,
  password: string,
): Promise<string> {
  const csrf = await fetch(`${baseUrl}/api/auth/csrf`, { headers: behindTlsProxy });
  const csrfCookie = `${csrfCookieName}=${cookieValue(csrf.headers.getSetCookie(), csrfCookieName)}`;
  const { data } = (await csrf.json()) as { data: { token: string } };
  const login = await fetch(`${baseUrl}/api/auth/login`, {
    method: 'POST',
    headers: {
      ...behindTlsProxy,
      'content-type': 'application/json',
      cookie: csrfCookie,
      'x-csrf-token': data.token,
    },
    body: JSON.stringify({ email, password }),
  });
  if (login.status !== 200) throw new Error(`sign-in as ${email} answered ${login.status}`);
  return `${csrfCookie}; ${sessionCookie}=${cookieValue(login.headers.getSetCookie(), sessionCookie)}`;
}

export interface LoadOptions {
  connections: number;
  durationSeconds: number;
  warmupSeconds: number;
}

/** User + system CPU time of a process so far, in ms (clock ticks are 1/100 s on Linux). */
function cpuMs(pid: number): number {
  const fields = readFileSync(`/proc/${pid}/stat`, 'utf8').split(') ')[1]?.split(' ') ?? [];
  return (Number(fields[11]) + Number(fields[12])) * 10;
}

/** Warms the route up, then measures it; every answer must be a 2xx. */
export async function measureRoute(
  name: string,
  url: string,
  headers: Record<string, string>,
  options: LoadOptions,
  probe: Probe,
): Promise<RouteResult> {
  const base = { url, headers, connections: options.connections };
  if (options.warmupSeconds > 0) await autocannon({ ...base, duration: options.warmupSeconds });
  const before = {
    questions: await probe.questions(),
    api: cpuMs(probe.apiPid),
    db: cpuMs(probe.dbPid),
  };
  const result = await autocannon({ ...base, duration: options.durationSeconds });
  // The probe's own query counts once; it is left in (one statement over thousands of requests).
  const questions = (await probe.questions()) - before.questions;
  const requests = result.requests.total;
  const perRequest = (value: number) => (requests > 0 ? value / requests : NaN);
  return {
    name,
    requestsPerSecond: result.requests.average,
    p50Ms: result.latency.p50,
    p99Ms: result.latency.p99,
    non2xx: result.non2xx,
    errors: result.errors,
    requests,
    statementsPerRequest: perRequest(questions),
    apiCpuMs: perRequest(cpuMs(probe.apiPid) - before.api),
    dbCpuMs: perRequest(cpuMs(probe.dbPid) - before.db),
  };
}

function residentMb(pid: number): number {
  const status = readFileSync(`/proc/${pid}/status`, 'utf8');
  const kb = /VmRSS:\s+(\d+) kB/.exec(status)?.[1];
  return kb ? Number(kb) / 1024 : NaN;
}

/** Samples the resident size of `pid` every 250 ms until stopped; reports the peak. */
export function sampleResidentMemory(pid: number) {
  let peakMb = residentMb(pid);
  const timer = setInterval(() => {
    try {
      peakMb = Math.max(peakMb, residentMb(pid));
    } catch {
      // the process has gone; keep the last peak
    }
  }, 250);
  return {
    currentMb: () => residentMb(pid),
    stop(): number {
      clearInterval(timer);
      return peakMb;
    },
  };
}
