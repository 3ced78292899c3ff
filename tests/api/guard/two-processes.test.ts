// Scale-out: two real API processes (apps/api/src/server.ts, started as children like
// scripts/bench-api.ts does) on one database behave as one: a sign-in on one is valid on the
// other, a sign-out on one ends it on both, a removed member loses access on both, and failed
// sign-ins are counted across both (sessions and rate limits live in MariaDB). docs/SCALING.md.
import { spawn } from 'node:child_process';
import type { ChildProcess } from 'node:child_process';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { instances } from '../../../scripts/lib/instances.js';
import { projectRoot } from '../../../scripts/lib/paths.js';
import { stopService, waitForHttp } from '../../../scripts/lib/processes.js';
import { testPassword, uniqueEmail } from '../../fixtures/factories.js';
import { tokenFromMail, waitForMail } from '../../fixtures/mail.js';
import { testEnvVars } from '../../fixtures/test-env.js';

const [portA, portB] = instances.test.scaleOutApiPorts;
const a = `http://127.0.0.1:${portA}`;
const b = `http://127.0.0.1:${portB}`;
const children: ChildProcess[] = [];

/** A browser stand-in: one cookie jar and CSRF token, sent to either process. */
class Browser {
  private jar = new Map<string, string>();
  private csrf = '';

  async send(base: string, method: string, path: string, body?: object) {
    const res = await fetch(`${base}${path}`, {
      method,
      headers: {
        cookie: [...this.jar].map(([k, v]) => `${k}=${v}`).join('; '),
        'x-csrf-token': this.csrf,
        ...(body ? { 'content-type': 'application/json' } : {}),
      },
      body: body ? JSON.stringify(body) : undefined,
    });
    for (const line of res.headers.getSetCookie()) {
      const [pair = ''] = line.split(';');
      const at = pair.indexOf('=');
      this.jar.set(pair.slice(0, at), pair.slice(at + 1));
    }
    const text = await res.text();
    const json = text && res.headers.get('content-type')?.includes('json') ? JSON.parse(text) : {};
    return { status: res.status, body: json as { data?: unknown; code?: string } };
  }

  async start(base: string): Promise<this> {
    const res = await this.send(base, 'GET', '/api/auth/csrf');
    this.csrf = (res.body.data as { token: string }).token;
    return this;
  }
}

function startApi(port: number): ChildProcess {
  const child = spawn(process.execPath, ['--import', 'tsx', 'apps/api/src/server.ts'], {
    cwd: projectRoot,
    env: { ...process.env, ...testEnvVars, PORT: String(port), PLANNER_THREADS: '1' },
    stdio: ['ignore', 'ignore', 'inherit'],
    detached: true,
  });
  children.push(child);
  return child;
}

describe('two API processes on one database', () => {
  beforeAll(async () => {
    const [first, second] = [startApi(portA), startApi(portB)];
    await Promise.all([
      waitForHttp(`${a}/api/health`, 60_000, first),
      waitForHttp(`${b}/api/health`, 60_000, second),
    ]);
  }, 90_000);

  afterAll(async () => {
    await Promise.all(children.map((child) => stopService(child)));
  });

  it('keeps a sign-in made on one valid on the other, and a sign-out on one ends it on both', async () => {
    const owner = await new Browser().start(a);
    const email = uniqueEmail('scale');
    const signup = await owner.send(a, 'POST', '/api/auth/signup', {
      companyName: 'Scale Turf',
      name: 'Sam Scale',
      email,
      password: testPassword,
    });
    expect(signup.status).toBe(201);
    expect((await owner.send(b, 'GET', '/api/me')).status).toBe(200);
    expect((await owner.send(b, 'POST', '/api/auth/logout')).status).toBeLessThan(300);
    expect((await owner.send(a, 'GET', '/api/me')).status).toBe(401);
    expect((await owner.send(b, 'GET', '/api/me')).status).toBe(401);
  });

  it('takes access away on both at once when a member is removed on one', async () => {
    const owner = await new Browser().start(a);
    await owner.send(a, 'POST', '/api/auth/signup', {
      companyName: 'Scale Members Turf',
      name: 'Olive Owner',
      email: uniqueEmail('scale-owner'),
      password: testPassword,
    });
    const memberEmail = uniqueEmail('scale-office');
    expect(
      (await owner.send(a, 'POST', '/api/invitations', { email: memberEmail, role: 'office' }))
        .status,
    ).toBe(201);
    const token = tokenFromMail(await waitForMail(memberEmail), 'invitations');
    const member = await new Browser().start(b);
    const accepted = await member.send(b, 'POST', `/api/invitations/${token}/accept`, {
      name: 'Oscar Office',
      password: testPassword,
    });
    expect(accepted.status).toBe(200);
    expect((await member.send(a, 'GET', '/api/customers')).status).toBe(200);

    const members = (await owner.send(b, 'GET', '/api/members')).body.data as {
      id: string;
      role: string;
    }[];
    const office = members.find((m) => m.role === 'office')!;
    expect((await owner.send(b, 'DELETE', `/api/members/${office.id}`)).status).toBe(204);
    expect((await member.send(a, 'GET', '/api/customers')).status).toBe(401);
    expect((await member.send(b, 'GET', '/api/customers')).status).toBe(401);
  });

  it('counts failed sign-ins across both processes', async () => {
    const owner = await new Browser().start(a);
    const email = uniqueEmail('scale-limit');
    await owner.send(a, 'POST', '/api/auth/signup', {
      companyName: 'Scale Limit Turf',
      name: 'Lim Owner',
      email,
      password: testPassword,
    });
    const guesser = await new Browser().start(b);
    // LOGIN_MAX_FAILURES is 5 per IP and e-mail in the test environment.
    for (let i = 0; i < 5; i += 1) {
      const res = await guesser.send(i % 2 ? a : b, 'POST', '/api/auth/login', {
        email,
        password: 'wrong-password-1',
      });
      expect(res.status).toBe(401);
    }
    for (const base of [a, b]) {
      const res = await guesser.send(base, 'POST', '/api/auth/login', {
        email,
        password: testPassword,
      });
      expect({ status: res.status, code: res.body.code }).toEqual({
        status: 429,
        code: 'RATE_LIMITED',
      });
    }
  });
});
