// Ports and names of the two local set-ups. Development and tests never share a database.
// These are local, loopback-only credentials for disposable data, not secrets.
//
// SW_PORT_OFFSET (a whole number, default 0) shifts every port, so that several checkouts of
// the project can run their own instances side by side on one machine. The ports of one
// checkout span 1025–1091 and 3307–12113, so use multiples of 100 to keep checkouts apart.
function readPortOffset(raw: string | undefined): number {
  if (raw === undefined || raw === '') return 0;
  const offset = Number(raw);
  if (!Number.isInteger(offset) || offset < 0 || offset > 900) {
    throw new Error(`SW_PORT_OFFSET must be a whole number from 0 to 900, got "${raw}"`);
  }
  return offset;
}

const offset = readPortOffset(process.env.SW_PORT_OFFSET);

export const instances = {
  dev: {
    db: {
      port: 3307 + offset,
      database: 'seamwright',
      user: 'seamwright',
      password: 'seamwright-local',
    },
    apiPort: 5170 + offset,
    smtpPort: 1025 + offset,
    mailWebPort: 1080 + offset,
    processorPort: 12111 + offset,
  },
  test: {
    db: {
      port: 3308 + offset,
      database: 'seamwright_test',
      user: 'seamwright',
      password: 'seamwright-local',
    },
    apiPort: 5171 + offset,
    smtpPort: 1026 + offset,
    mailWebPort: 1081 + offset,
    processorPort: 12112 + offset,
    /** The API suite's own maildev, apart from the e2e run's. */
    apiSuiteSmtpPort: 1036 + offset,
    apiSuiteMailWebPort: 1091 + offset,
    /** The API suite's own processor fake (tests/api/global-setup.ts), apart from the e2e run's. */
    apiSuiteProcessorPort: 12113 + offset,
    /** `pnpm bench:api`: the API under test and the bare-Express yardsticks beside it. */
    benchApiPort: 5178 + offset,
    benchBaselinePort: 5179 + offset,
    /** tests/api/guard/two-processes.test.ts: two API processes on the test database. */
    scaleOutApiPorts: [5174 + offset, 5175 + offset],
    /**
     * A scratch MariaDB of its own (.data/fault) that tests/api/guard/database-faults.test.ts
     * stops and kills under a running API, so the other suites' database is never disturbed.
     */
    faultDb: {
      port: 3309 + offset,
      database: 'seamwright_fault',
      user: 'seamwright',
      password: 'seamwright-local',
    },
  },
} as const;

export type InstanceName = keyof typeof instances;
