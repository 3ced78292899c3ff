import type { ReactNode } from 'react';
import type { MeView } from '@seamwright/shared';
import { SessionProvider } from '../lib/session';

/** A signed-in owner of a made-up company, for component tests that read the session. */
export function testSession(overrides: Partial<MeView['company']> = {}): MeView {
  const company = {
    id: '00000000-0000-4000-8000-000000000001',
    name: 'Test Turf Co',
    slug: 'test-turf-co',
    timeZone: 'America/Denver',
    region: 'CO',
    currency: 'USD',
    measurementSystem: 'imperial' as const,
    ...overrides,
  };
  return {
    user: {
      id: '00000000-0000-4000-8000-000000000002',
      name: 'Sam Tester',
      email: 'sam@example.test',
    },
    company,
    role: 'owner',
    companies: [{ companyId: company.id, companyName: company.name, role: 'owner' }],
  };
}

export function WithSession({ me, children }: { me: MeView; children: ReactNode }) {
  return <SessionProvider me={me}>{children}</SessionProvider>;
}
