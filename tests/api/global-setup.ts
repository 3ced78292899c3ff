// Once per `vitest run --project api`: the test MariaDB (started or reused) with a fresh,
// migrated database, and a maildev of this suite's own. Teardown stops what it started.
import { createSequelize, migrateDatabase } from '@seamwright/api';
import { instances } from '../../scripts/lib/instances.js';
import { startMailSink } from '../../scripts/lib/maildev.js';
import type { MailSink } from '../../scripts/lib/maildev.js';
import { recreateDatabase, startMariadb } from '../../scripts/lib/mariadb.js';
import { testMail } from '../fixtures/test-env.js';

let mail: MailSink | undefined;

export async function setup(): Promise<void> {
  const { db } = instances.test;
  const mariadb = await startMariadb('test', db.port);
  recreateDatabase(mariadb, db);
  const sequelize = createSequelize({
    host: '127.0.0.1',
    port: db.port,
    name: db.database,
    user: db.user,
    password: db.password,
  });
  try {
    await migrateDatabase(sequelize);
  } finally {
    await sequelize.close();
  }
  mail = await startMailSink('test-api', testMail.smtpPort, testMail.webPort);
}

export async function teardown(): Promise<void> {
  await mail?.stop();
}
