/** Build-time settings. The API is always served from the same origin under `/api`. */
export const env = {
  apiBaseUrl: '/api',
  isDev: import.meta.env.DEV,
} as const;
