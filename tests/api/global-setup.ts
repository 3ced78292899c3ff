// Once per `vitest run --project api`: the test MariaDB (started or reused) with a fresh,
// migrated database, a maildev and a processor fake of this suite's own. Teardown stops what it
// started. The fake sends no webhooks until a test points it at an app it listens with
// (`POST /_test/config { webhookUrl }`, see tests/api/processor/).
import { startFakeProcessor } from '@seamwright/fake-processor';
import type { FakeProcessor } from '@seamwright/fake-processor';
import { createSequelize, migrateDatabase } from '@seamwright/api';
import { instances } from '../../scripts/lib/instances.js';
import { startMailSink } from '../../scripts/lib/maildev.js';
import type { MailSink } from '../../scripts/lib/maildev.js';
import { recreateDatabase, startMariadb } from '../../scripts/lib/mariadb.js';
import { testMail, testProcessor } from '../fixtures/test-env.js';

let mail: MailSink | undefined;
let processor: FakeProcessor | undefined;

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
  processor = await startFakeProcessor(testProcessor.port, {
    apiKey: testProcessor.secretKey,
    webhookSecret: testProcessor.webhookSecret,
    webhookUrl: null,
    retryDelaysMs: [50, 200],
  });
}

export async function teardown(): Promise<void> {
  await mail?.stop();
  await processor?.stop();
}
