import { describe, expect, it } from 'vitest';
import { selectRows } from '@seamwright/api';
import type { Role } from '@seamwright/shared';
import { testApp } from '../../fixtures/app.js';
import { newClient } from '../../fixtures/client.js';
import { addMember, signUpCompany } from '../../fixtures/factories.js';

const everyRole: Role[] = ['owner', 'office', 'bookkeeper', 'crew_lead'];

async function personIn(role: Role) {
  const { app } = testApp();
  const owner = await signUpCompany(app);
  return role === 'owner' ? owner : addMember(app, owner.client, role);
}

describe('PATCH /api/me', () => {
  it.each(everyRole)(
    'lets the %s change their own name and answers the new MeView',
    async (role) => {
      const { sequelize } = testApp();
      const person = await personIn(role);
      const res = await person.client.patch('/api/me', { name: '  Rowan Renamed  ' }).expect(200);
      expect(res.body.data.user).toEqual({
        id: person.me.user.id,
        name: 'Rowan Renamed',
        email: person.email,
      });
      expect(res.body.data.role).toBe(role);
      const me = await person.client.get('/api/me').expect(200);
      expect(me.body.data.user.name).toBe('Rowan Renamed');
      const audit = await selectRows(
        sequelize,
        'SELECT action, entity_id FROM audit_events WHERE company_id = ? AND action = ?',
        [person.me.company.id, 'user.name_changed'],
      );
      expect(audit).toEqual([{ action: 'user.name_changed', entity_id: person.me.user.id }]);
    },
  );

  it('refuses an empty name with 400 naming the field and keeps the old name', async () => {
    const person = await personIn('office');
    const res = await person.client.patch('/api/me', { name: '   ' }).expect(400);
    expect(res.body.code).toBe('VALIDATION_FAILED');
    expect(res.body.errors).toEqual([{ path: 'name', message: 'Your name is required' }]);
    expect(res.body.detail).toBe('name: Your name is required');
    const me = await person.client.get('/api/me').expect(200);
    expect(me.body.data.user.name).toBe(person.me.user.name);
  });

  it('refuses a name over 120 characters', async () => {
    const person = await personIn('crew_lead');
    const res = await person.client.patch('/api/me', { name: 'x'.repeat(121) }).expect(400);
    expect(res.body.errors[0].path).toBe('name');
  });

  it('answers 401 when nobody is signed in', async () => {
    const anonymous = await newClient(testApp().app);
    const res = await anonymous.patch('/api/me', { name: 'Nobody' }).expect(401);
    expect(res.body.code).toBe('UNAUTHENTICATED');
  });
});
