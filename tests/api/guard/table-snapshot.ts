// Checksums of every data table, to prove a batch of requests wrote nothing. The tenant tables
// come from tenant-models.json (so a new tenant model is included by itself), plus the tables
// that hold people, companies, sessions and one-time links.
import { selectRows } from '@seamwright/api';
import type { TestSequelize } from '../../fixtures/app.js';
import tenantModelNames from '../../../apps/api/src/db/models/tenant-models.json';

const sharedTables = ['companies', 'users', 'sessions', 'password_resets', 'customer_counts'];

export function snapshotTables(sequelize: TestSequelize): string[] {
  const tenant = tenantModelNames.map((name) => {
    const model = sequelize.models[name];
    if (!model) throw new Error(`tenant-models.json names ${name}, which is not registered`);
    return model.tableName;
  });
  return [...new Set([...tenant, ...sharedTables])].sort();
}

/** `CHECKSUM TABLE` of every snapshot table: equal snapshots mean no row added, changed or gone. */
export async function tableChecksums(sequelize: TestSequelize): Promise<Record<string, string>> {
  const tables = snapshotTables(sequelize);
  const rows = await selectRows<{ Table: string; Checksum: string | number | null }>(
    sequelize,
    `CHECKSUM TABLE ${tables.map((t) => `\`${t}\``).join(', ')}`,
  );
  return Object.fromEntries(rows.map((r) => [r.Table.replace(/^.*\./, ''), String(r.Checksum)]));
}
