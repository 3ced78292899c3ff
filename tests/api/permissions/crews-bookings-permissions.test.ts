// The permission rows for crews and bookings (the routes' role checks are in
// tests/api/crews and tests/api/bookings/booking-roles.test.ts).
import { describe, expect, it } from 'vitest';
import { can, permissionTable } from '@seamwright/shared';

describe('crews and bookings permissions', () => {
  it('lets everyone read crews, owners and office manage them', () => {
    expect(permissionTable['crews.read']).toEqual(['owner', 'office', 'bookkeeper', 'crew_lead']);
    expect(permissionTable['crews.manage']).toEqual(['owner', 'office']);
  });

  it('lets crew leads read bookings (their own crews only, filtered by the service), never write', () => {
    expect(permissionTable['bookings.read']).toEqual(['owner', 'office', 'crew_lead']);
    expect(permissionTable['bookings.write']).toEqual(['owner', 'office']);
    expect(can('crew_lead', 'bookings.write')).toBe(false);
    expect(can('bookkeeper', 'bookings.read')).toBe(false);
  });
});
