/**
 * The keys the API and the local processor fake (apps/fake-processor) share in development and
 * tests. They only ever reach the fake on 127.0.0.1; production must set its own (the API
 * refuses to start in production with these).
 */
export const localProcessorDefaults = {
  secretKey: 'sk_test_seamwright_local_fake_processor',
  webhookSecret: 'whsec_seamwright_local_fake_processor',
} as const;
