// Ports and names of the two local set-ups. Development and tests never share a database.
// These are local, loopback-only credentials for disposable data, not secrets.
export const instances = {
  dev: {
    db: { port: 3307, database: 'seamwright', user: 'seamwright', password: 'seamwright-local' },
    apiPort: 5170,
    smtpPort: 1025,
    mailWebPort: 1080,
    processorPort: 12111,
  },
  test: {
    db: {
      port: 3308,
      database: 'seamwright_test',
      user: 'seamwright',
      password: 'seamwright-local',
    },
    apiPort: 5171,
    smtpPort: 1026,
    mailWebPort: 1081,
    processorPort: 12112,
  },
} as const;

export type InstanceName = keyof typeof instances;
