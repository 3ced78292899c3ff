// Exactly once across processes: two real API processes (apps/api/src/server.ts, as the scripts
// start it) run the reminder worker on the test database with a fixed clock four weeks ahead;
// thirty invoices become due at the same moment; one process is killed with SIGKILL mid-run.
// Every due step must be logged once, and maildev must hold one message per invoice-step.
import { spawn } from 'node:child_process';
import type { ChildProcess } from 'node:child_process';
import { createServer } from 'node:net';
import { addCalendarDays } from '@seamwright/domain';
import { selectRows } from '@seamwright/api';
import { afterAll, describe, expect, it } from 'vitest';
import { projectRoot } from '../../../scripts/lib/paths.js';
import { stopService, waitForHttp } from '../../../scripts/lib/processes.js';
import { testApp } from '../../fixtures/app.js';
import { signUpCompany } from '../../fixtures/factories.js';
import { billedCustomer, mailsTo, messageIdOf, sentInvoice } from './reminder-fixtures.js';

const { app, sequelize } = testApp();
const children: ChildProcess[] = [];

afterAll(async () => {
  for (const child of children) await stopService(child, 5000);
});

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      server.close(() => resolve(port));
    });
  });
}

async function startApi(clock: string): Promise<{ child: ChildProcess; url: string }> {
  const port = await freePort();
  const child = spawn(process.execPath, ['--import', 'tsx', 'apps/api/src/server.ts'], {
    cwd: projectRoot,
    env: {
      ...process.env,
      PORT: String(port),
      LOG_LEVEL: 'silent',
      REMINDER_WORKER: 'true',
      // Small steps so that the kill lands while work is left: one invoice per pass.
      REMINDER_INTERVAL_MS: '50',
      REMINDER_BATCH_SIZE: '1',
      SW_REMINDER_CLOCK: clock,
    },
    stdio: ['ignore', 'ignore', 'inherit'],
    detached: true,
  });
  children.push(child);
  return { child, url: `http://127.0.0.1:${port}` };
}

async function loggedSteps(companyId: string) {
  return selectRows<{ invoice_id: string; offset_days: number; n: number | bigint }>(
    sequelize,
    `SELECT invoice_id, offset_days, COUNT(*) AS n FROM invoice_reminders
      WHERE company_id = ? GROUP BY invoice_id, offset_days`,
    [companyId],
  );
}

describe('the reminder worker in two API processes', () => {
  it('logs and mails each due step once, with one process killed mid-run', async () => {
    const owner = await signUpCompany(app);
    const companyId = owner.me.company.id;
    const settings = { enabled: true, offsets: [-3, 0, 7, 14, 30] };
    // Off while the invoices are sent, so that all thirty fall due in one commit below.
    await owner.client.put('/api/settings/reminders', { ...settings, enabled: false }).expect(200);
    const billed = await billedCustomer(owner.client);
    const invoices = [];
    for (let i = 0; i < 30; i += 1) invoices.push(await sentInvoice(owner.client, billed));
    const first = invoices[0]!;
    // Four weeks after sending: the 14-days-overdue step is the latest due one of each invoice.
    const today = addCalendarDays(first.dueDate, 14);
    const clock = `${today}T19:00:00Z`;
    const a = await startApi(clock);
    const b = await startApi(clock);
    await Promise.all([
      waitForHttp(`${a.url}/api/health`, 30_000, a.child),
      waitForHttp(`${b.url}/api/health`, 30_000, b.child),
    ]);
    await owner.client.put('/api/settings/reminders', settings).expect(200);

    const expectedIds = new Set(invoices.map((inv) => `<reminder.${inv.id}.14@127.0.0.1>`));
    const reminderMails = async () =>
      (await mailsTo(billed.email)).filter((m) => expectedIds.has(messageIdOf(m) ?? ''));
    const deadline = Date.now() + 20_000;
    while ((await reminderMails()).length < 3 && Date.now() < deadline)
      await new Promise((resolve) => setTimeout(resolve, 10));
    process.kill(-a.child.pid!, 'SIGKILL');
    const loggedAtKill = (await loggedSteps(companyId)).length;
    expect(loggedAtKill).toBeLessThan(30);

    while ((await loggedSteps(companyId)).length < 30 && Date.now() < deadline)
      await new Promise((resolve) => setTimeout(resolve, 100));
    const steps = await loggedSteps(companyId);
    expect(steps).toHaveLength(30);
    expect(steps.every((s) => Number(s.n) === 1 && s.offset_days === 14)).toBe(true);
    const next = await selectRows<{ next_reminder_on: string }>(
      sequelize,
      'SELECT DISTINCT next_reminder_on FROM invoices WHERE company_id = ?',
      [companyId],
    );
    expect(next.map((r) => String(r.next_reminder_on))).toEqual([
      addCalendarDays(first.dueDate, 30),
    ]);

    // Let the survivor run a few more passes: nothing more may arrive.
    await new Promise((resolve) => setTimeout(resolve, 500));
    const mails = await reminderMails();
    const copies = new Map<string, number>();
    for (const mail of mails) {
      const id = messageIdOf(mail) ?? '';
      copies.set(id, (copies.get(id) ?? 0) + 1);
    }
    expect([...copies.keys()].sort()).toEqual([...expectedIds].sort());
    // The documented exception (reminder-worker.ts): a process killed between the SMTP
    // server's accept and its commit has that one step sent again by the other process, under
    // the same Message-ID. A single kill can therefore leave at most one message twice.
    const repeated = [...copies.values()].filter((n) => n > 1);
    expect(repeated.length).toBeLessThanOrEqual(1);
    expect(repeated.every((n) => n === 2)).toBe(true);
  }, 120_000);
});
