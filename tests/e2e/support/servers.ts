// Where the servers of an end-to-end run listen (set by scripts/run-tests.ts).
export const baseUrl = process.env.E2E_BASE_URL ?? 'http://127.0.0.1:5171';
export const mailUrl = process.env.E2E_MAIL_URL ?? 'http://127.0.0.1:1081';
