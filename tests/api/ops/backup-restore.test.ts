// `pnpm db:backup` and `pnpm db:restore` as commands, on a scratch database of the test
// instance filled with the demo company: back up, wipe, restore, and every table's
// CHECKSUM TABLE (MariaDB's own row checksum) is what it was.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createSequelize, migrateDatabase, seedDemoData } from '@seamwright/api';
import { tableChecksums } from '../../../scripts/lib/backup.js';
import type { DumpTarget } from '../../../scripts/lib/backup.js';
import { instances } from '../../../scripts/lib/instances.js';
import { projectRoot } from '../../../scripts/lib/paths.js';
import { recreateDatabase, startMariadb } from '../../../scripts/lib/mariadb.js';
import { testApp } from '../../fixtures/app.js';

const scratch: DumpTarget = {
  host: '127.0.0.1',
  ...instances.test.db,
  database: 'seamwright_backup_check',
};

/** Runs a project script as the person would (through tsx), in the test instance. */
function run(script: string, args: string[]) {
  const result = spawnSync(
    'pnpm',
    ['exec', 'tsx', `scripts/${script}`, ...args, 'test', `--database=${scratch.database}`],
    { cwd: projectRoot, encoding: 'utf8', env: process.env, timeout: 120_000 },
  );
  return { status: result.status, output: `${result.stdout}${result.stderr}` };
}

describe('database backup and restore', () => {
  const dumpFile = join(mkdtempSync(join(tmpdir(), 'sw-backup-')), 'scratch.sql.gz');

  beforeAll(async () => {
    const mariadb = await startMariadb('test', scratch.port);
    recreateDatabase(mariadb, scratch);
    // The test app first: models bind to the Sequelize made last, which must be the scratch one
    // for the seed's reads outside its transactions.
    const { plannerPool } = testApp();
    const sequelize = createSequelize({ ...scratch, name: scratch.database });
    try {
      await migrateDatabase(sequelize);
      await seedDemoData(sequelize, { bcryptCost: 4 }, plannerPool);
      // Text a dump must carry exactly: quotes, a backslash, a newline, a tab, emoji, a NUL.
      await sequelize.query(
        "UPDATE customers SET notes = CONCAT('It''s \"fine\" \\\\ line\\nnext\\tcol 🌱 ', CHAR(0)) LIMIT 1",
      );
    } finally {
      await sequelize.close();
    }
  });

  afterAll(async () => {
    const mariadb = await startMariadb('test', scratch.port);
    recreateDatabase(mariadb, scratch);
  });

  it('restores every table exactly as it was backed up', async () => {
    const before = await tableChecksums(scratch);
    expect(Object.keys(before)).toEqual(
      expect.arrayContaining(['customers', 'jobs', 'job_areas', 'sessions', 'audit_events']),
    );

    const backup = run('backup-db.ts', [`--out=${dumpFile}`]);
    expect(backup.status, backup.output).toBe(0);
    // gzip's magic bytes (RFC 1952).
    expect([...readFileSync(dumpFile).subarray(0, 2)]).toEqual([0x1f, 0x8b]);

    const mariadb = await startMariadb('test', scratch.port);
    recreateDatabase(mariadb, scratch);
    expect(await tableChecksums(scratch)).toEqual({});

    const dryRun = run('restore-db.ts', [dumpFile, '--dry-run']);
    expect(dryRun.status, dryRun.output).toBe(0);
    expect(dryRun.output).toMatch(/dry run/);
    expect(await tableChecksums(scratch)).toEqual({});

    const restore = run('restore-db.ts', [dumpFile]);
    expect(restore.status, restore.output).toBe(0);
    expect(await tableChecksums(scratch)).toEqual(before);
  });

  it('replaces tables changed since the backup, and drops tables the dump does not have', async () => {
    const before = await tableChecksums(scratch);
    const sequelize = createSequelize({ ...scratch, name: scratch.database });
    try {
      await sequelize.query('DELETE FROM audit_events');
      await sequelize.query('CREATE TABLE stray_table (id INT PRIMARY KEY)');
    } finally {
      await sequelize.close();
    }
    expect(await tableChecksums(scratch)).not.toEqual(before);
    const restore = run('restore-db.ts', [dumpFile]);
    expect(restore.status, restore.output).toBe(0);
    expect(await tableChecksums(scratch)).toEqual(before);
  });

  it('refuses a missing dump file with a clear message and changes nothing', async () => {
    const before = await tableChecksums(scratch);
    const result = run('restore-db.ts', ['/nonexistent/backup.sql.gz']);
    expect(result.status).not.toBe(0);
    expect(result.output).toMatch(/no such file/);
    expect(await tableChecksums(scratch)).toEqual(before);
  });
});
