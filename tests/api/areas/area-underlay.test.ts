// A photo or sketch under an area's drawing (issue 7 item 2): upload, scale by two points a
// known distance apart, placement, removal, roles, and nothing half-saved.
import { readdir } from 'node:fs/promises';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { loadEnv, selectRows } from '@seamwright/api';
import { testApp } from '../../fixtures/app.js';
import { createArea } from '../../fixtures/areas.js';
import { createCustomer, createJob, createSite, signUpTeam } from '../../fixtures/factories.js';
import type { Team } from '../../fixtures/factories.js';
import { pngImage, uploadFile } from '../../fixtures/images.js';

const uploadsDir = loadEnv().uploadsDir;

async function storedFilesOf(companyId: string): Promise<string[]> {
  try {
    return (await readdir(join(uploadsDir, companyId))).sort();
  } catch {
    return [];
  }
}

describe('area underlays', () => {
  let team: Team;
  let companyId: string;
  let customerId: string;
  let siteId: string;
  let jobId: string;

  beforeAll(async () => {
    team = await signUpTeam(testApp().app);
    companyId = team.owner.me.company.id;
    customerId = (await createCustomer(team.owner.client)).id;
    siteId = (await createSite(team.owner.client, customerId)).id;
    jobId = (await createJob(team.owner.client, customerId, siteId, 'Underlay job')).id;
  });

  async function areaWithUnderlay(width = 200, height = 100) {
    const area = await createArea(team.owner.client, jobId);
    const res = await uploadFile(
      team.office.client,
      `/api/areas/${area.id}/underlay`,
      pngImage(width, height),
      'yard.png',
    ).expect(201);
    return { areaId: area.id, underlay: res.body.data };
  }

  it('starts unscaled at the drawing’s north-west corner and shows on the area', async () => {
    const { areaId, underlay } = await areaWithUnderlay();
    // The fixture rectangle is 30 × 20 ft from (0, 0): its north-west corner is (0, 20).
    expect(underlay).toMatchObject({
      widthPx: 200,
      heightPx: 100,
      feetPerPixel: null,
      scale: null,
      offsetFt: { x: 0, y: 20 },
      rotationDeg: 0,
      opacity: 0.5,
    });
    const area = await team.bookkeeper.client.get(`/api/areas/${areaId}`).expect(200);
    expect(area.body.data.underlay).toEqual(underlay);
  });

  it('stores feet per pixel from two points and their distance, with the placement', async () => {
    const { areaId } = await areaWithUnderlay();
    // Plain geometry (from memory): 10 ft over two points 100 px apart is 0.1 ft per pixel.
    const res = await team.office.client
      .put(`/api/areas/${areaId}/underlay/scale`, {
        a: { x: 20, y: 50 },
        b: { x: 120, y: 50 },
        distanceFt: 10,
        offsetFt: { x: -2.5, y: 24 },
        rotationDeg: 15,
        opacity: 0.7,
      })
      .expect(200);
    expect(res.body.data).toMatchObject({
      scale: { a: { x: 20, y: 50 }, b: { x: 120, y: 50 }, distanceFt: 10 },
      offsetFt: { x: -2.5, y: 24 },
      rotationDeg: 15,
      opacity: 0.7,
    });
    expect(res.body.data.feetPerPixel).toBeCloseTo(0.1, 12);
    // A 3-4-5 triangle: 50 px along the slant, 25 ft → 0.5 ft/px; placement kept when absent.
    const again = await team.office.client
      .put(`/api/areas/${areaId}/underlay/scale`, {
        a: { x: 0, y: 0 },
        b: { x: 30, y: 40 },
        distanceFt: 25,
      })
      .expect(200);
    expect(again.body.data.feetPerPixel).toBeCloseTo(0.5, 12);
    expect(again.body.data).toMatchObject({ rotationDeg: 15, opacity: 0.7 });
    const [row] = await selectRows(
      testApp().sequelize,
      'SELECT underlay FROM job_areas WHERE id = ?',
      [areaId],
    );
    const stored = typeof row?.underlay === 'string' ? JSON.parse(row.underlay) : row?.underlay;
    expect(stored.feetPerPixel).toBeCloseTo(0.5, 12);
  });

  it('refuses a bad distance or points with 400 naming the field, and changes nothing', async () => {
    const { areaId, underlay } = await areaWithUnderlay(200, 100);
    const put = (body: object) =>
      team.office.client.put(`/api/areas/${areaId}/underlay/scale`, body);
    const pathsOf = async (body: object) => {
      const res = await put(body).expect(400);
      expect(res.headers['content-type']).toMatch(/problem\+json/);
      return (res.body.errors as { path: string }[]).map((e) => e.path);
    };
    const a = { x: 0, y: 0 };
    const b = { x: 100, y: 0 };
    expect(await pathsOf({ a, b, distanceFt: 0 })).toEqual(['distanceFt']);
    expect(await pathsOf({ a, b, distanceFt: -3 })).toEqual(['distanceFt']);
    expect(await pathsOf({ a, b, distanceFt: 'ten' })).toEqual(['distanceFt']);
    expect(await pathsOf({ a, b })).toEqual(['distanceFt']);
    expect(await pathsOf({ a, b: { x: 0, y: 0 }, distanceFt: 10 })).toEqual(['b']);
    expect(await pathsOf({ a, b: { x: 201, y: 0 }, distanceFt: 10 })).toEqual(['b.x']);
    expect(await pathsOf({ a: { x: 5, y: 101 }, b, distanceFt: 10 })).toEqual(['a.y']);
    expect(await pathsOf({ a, b, distanceFt: 10, opacity: 0 })).toEqual(['opacity']);
    const area = await team.owner.client.get(`/api/areas/${areaId}`).expect(200);
    expect(area.body.data.underlay).toEqual(underlay);
  });

  it('removes the image: the row, the file and the area’s reference', async () => {
    const { areaId, underlay } = await areaWithUnderlay();
    expect(await storedFilesOf(companyId)).toContain(underlay.uploadId);
    await team.office.client.del(`/api/areas/${areaId}/underlay`).expect(204);
    expect(await storedFilesOf(companyId)).not.toContain(underlay.uploadId);
    const rows = await selectRows(testApp().sequelize, 'SELECT id FROM uploads WHERE id = ?', [
      underlay.uploadId,
    ]);
    expect(rows).toEqual([]);
    const area = await team.office.client.get(`/api/areas/${areaId}`).expect(200);
    expect(area.body.data.underlay).toBeNull();
    await team.office.client.get(`/api/areas/${areaId}/underlay`).expect(404);
    await team.office.client.del(`/api/areas/${areaId}/underlay`).expect(404);
    await team.office.client
      .put(`/api/areas/${areaId}/underlay/scale`, {
        a: { x: 0, y: 0 },
        b: { x: 9, y: 0 },
        distanceFt: 1,
      })
      .expect(404);
  });

  it('deleting the area deletes its underlay and the file', async () => {
    const { areaId, underlay } = await areaWithUnderlay();
    await team.office.client.del(`/api/areas/${areaId}`).expect(204);
    expect(await storedFilesOf(companyId)).not.toContain(underlay.uploadId);
    const rows = await selectRows(testApp().sequelize, 'SELECT id FROM uploads WHERE id = ?', [
      underlay.uploadId,
    ]);
    expect(rows).toEqual([]);
  });

  it('keeps owner and office writing, the bookkeeper reading and the crew lead out', async () => {
    const { areaId } = await areaWithUnderlay();
    const url = `/api/areas/${areaId}/underlay`;
    const scale = { a: { x: 0, y: 0 }, b: { x: 50, y: 0 }, distanceFt: 5 };
    await team.owner.client.put(`${url}/scale`, scale).expect(200);
    await team.bookkeeper.client.get(url).expect(200);
    for (const res of [
      await uploadFile(team.bookkeeper.client, url, pngImage(4, 4), 'a.png'),
      await team.bookkeeper.client.put(`${url}/scale`, scale),
      await team.bookkeeper.client.del(url),
      await team.crew.client.get(url),
      await uploadFile(team.crew.client, url, pngImage(4, 4), 'a.png'),
      await team.crew.client.put(`${url}/scale`, scale),
      await team.crew.client.del(url),
    ]) {
      expect(res.status).toBe(403);
      expect(res.body.code).toBe('FORBIDDEN');
    }
    await team.owner.client.get(url).expect(200);
  });

  it('stores nothing when the write fails: a lost job refuses with 409 and the file is removed', async () => {
    const job = await createJob(team.owner.client, customerId, siteId, 'Lost job');
    const area = await createArea(team.owner.client, job.id);
    await team.office.client.patch(`/api/jobs/${job.id}`, { status: 'lost' }).expect(200);
    const files = await storedFilesOf(companyId);
    const rows = await selectRows(
      testApp().sequelize,
      'SELECT id FROM uploads WHERE company_id = ?',
      [companyId],
    );
    const res = await uploadFile(
      team.office.client,
      `/api/areas/${area.id}/underlay`,
      pngImage(8, 8),
      'late.png',
    );
    expect(res.status).toBe(409);
    expect(res.body.errors[0].path).toBe('status');
    expect(await storedFilesOf(companyId)).toEqual(files);
    expect(
      await selectRows(testApp().sequelize, 'SELECT id FROM uploads WHERE company_id = ?', [
        companyId,
      ]),
    ).toEqual(rows);
  });
});
