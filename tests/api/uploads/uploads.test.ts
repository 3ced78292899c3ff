// Uploads are checked by their content and size (issue 11 item 4, ASVS V12 file upload) and
// served with safe headers. Driven through the area underlay route, the first user of the module.
import { readdir } from 'node:fs/promises';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { loadEnv, selectRows } from '@seamwright/api';
import { maxUploadBytes } from '@seamwright/shared';
import { testApp } from '../../fixtures/app.js';
import { createArea } from '../../fixtures/areas.js';
import { createCustomer, createJob, createSite, signUpTeam } from '../../fixtures/factories.js';
import type { Team } from '../../fixtures/factories.js';
import { gifImage, jpegImage, pdfBytes, pngImage, uploadFile } from '../../fixtures/images.js';

const uploadsDir = loadEnv().uploadsDir;

async function storedFilesOf(companyId: string): Promise<string[]> {
  try {
    return await readdir(join(uploadsDir, companyId));
  } catch {
    return [];
  }
}

const uploadRows = (companyId: string) =>
  selectRows(testApp().sequelize, 'SELECT id FROM uploads WHERE company_id = ?', [companyId]);

describe('uploads: checked by content and size', () => {
  let team: Team;
  let areaId: string;
  let companyId: string;
  let url: string;

  beforeAll(async () => {
    team = await signUpTeam(testApp().app);
    companyId = team.owner.me.company.id;
    const customer = await createCustomer(team.owner.client);
    const site = await createSite(team.owner.client, customer.id);
    const job = await createJob(team.owner.client, customer.id, site.id, 'Uploads job');
    areaId = (await createArea(team.owner.client, job.id)).id;
    url = `/api/areas/${areaId}/underlay`;
  });

  /** Every refusal: a 4xx problem+json naming the field, and nothing stored. */
  async function expectRefused(
    pending: ReturnType<typeof uploadFile>,
    status: number,
    code: string,
    message: RegExp,
  ) {
    const before = { rows: await uploadRows(companyId), files: await storedFilesOf(companyId) };
    const res = await pending;
    expect(res.status).toBe(status);
    expect(res.headers['content-type']).toMatch(/application\/problem\+json/);
    expect(res.body.code).toBe(code);
    expect(res.body.errors).toEqual([{ path: 'file', message: expect.stringMatching(message) }]);
    expect(await uploadRows(companyId)).toEqual(before.rows);
    expect(await storedFilesOf(companyId)).toEqual(before.files);
  }

  it('refuses a file over the size limit with 413 naming the field', async () => {
    const png = pngImage(4, 4);
    const big = Buffer.concat([png, Buffer.alloc(maxUploadBytes + 1 - png.length)]);
    await expectRefused(
      uploadFile(team.office.client, url, big, 'huge.png'),
      413,
      'PAYLOAD_TOO_LARGE',
      /larger than 10 MB/,
    );
  });

  it('refuses an empty file', async () => {
    await expectRefused(
      uploadFile(team.office.client, url, Buffer.alloc(0), 'empty.png'),
      400,
      'VALIDATION_FAILED',
      /empty/,
    );
  });

  it('refuses a text file named .jpg (an image by its extension only)', async () => {
    await expectRefused(
      uploadFile(
        team.office.client,
        url,
        Buffer.from('just some words, not a photo\n'),
        'yard.jpg',
        {
          contentType: 'image/jpeg',
        },
      ),
      415,
      'UNSUPPORTED_MEDIA_TYPE',
      /JPEG, PNG or WebP/,
    );
  });

  it('refuses a disguised type: a PDF named .png and a GIF named .jpg', async () => {
    await expectRefused(
      uploadFile(team.office.client, url, pdfBytes, 'sketch.png'),
      415,
      'UNSUPPORTED_MEDIA_TYPE',
      /it is application\/pdf/,
    );
    await expectRefused(
      uploadFile(team.office.client, url, gifImage, 'photo.jpg', { contentType: 'image/jpeg' }),
      415,
      'UNSUPPORTED_MEDIA_TYPE',
      /it is image\/gif/,
    );
  });

  it('refuses a file in another field, and a request with no file, naming `file`', async () => {
    await expectRefused(
      uploadFile(team.office.client, url, pngImage(4, 4), 'a.png', { field: 'photo' }),
      400,
      'VALIDATION_FAILED',
      /form field "file", not "photo"/,
    );
    const res = await team.office.client.agent
      .post(url)
      .set('x-csrf-token', team.office.client.csrf)
      .field('note', 'no file here');
    expect(res.status).toBe(400);
    expect(res.body.errors).toEqual([{ path: 'file', message: 'Choose an image file to upload' }]);
  });

  it('answers a broken multipart body with a 400, never a 500', async () => {
    const res = await team.office.client.agent
      .post(url)
      .set('x-csrf-token', team.office.client.csrf)
      .set('content-type', 'multipart/form-data; boundary=xyz')
      .send('--xyz\r\nContent-Disposition: form-data; name="file"; filename="a.png"\r\n\r\nabc');
    expect(res.status).toBe(400);
    expect(res.body.errors[0].path).toBe('file');
  });

  it('takes multipart only on upload routes: elsewhere it is still a 415', async () => {
    const res = await team.office.client.agent
      .patch(`/api/areas/${areaId}`)
      .set('x-csrf-token', team.office.client.csrf)
      .attach('file', pngImage(2, 2), 'a.png');
    expect(res.status).toBe(415);
  });

  it('stores a real PNG by its content and serves it back with safe headers', async () => {
    const png = pngImage(40, 30);
    const res = await uploadFile(team.office.client, url, png, '../../etc/"back yard" sketch.PNG', {
      contentType: 'text/plain',
    }).expect(201);
    expect(res.body.data).toMatchObject({
      contentType: 'image/png',
      widthPx: 40,
      heightPx: 30,
      originalName: 'back yard_ sketch.png',
      feetPerPixel: null,
      url: expect.stringMatching(new RegExp(`^/api/areas/${areaId}/underlay\\?v=`)),
    });
    const [row] = await selectRows(
      testApp().sequelize,
      'SELECT kind, content_type, byte_size, sha256, created_by FROM uploads WHERE id = ?',
      [res.body.data.uploadId],
    );
    expect(row).toMatchObject({
      kind: 'area-underlay',
      content_type: 'image/png',
      byte_size: png.length,
      created_by: team.office.me.user.id,
    });
    expect(row?.sha256).toMatch(/^[0-9a-f]{64}$/);

    const served = await team.bookkeeper.client.get(url).buffer(true).expect(200);
    expect(served.headers['content-type']).toBe('image/png');
    expect(served.headers['content-disposition']).toBe('inline; filename="back yard_ sketch.png"');
    expect(served.headers['x-content-type-options']).toBe('nosniff');
    expect(served.headers['cache-control']).toMatch(/^private/);
    expect(Buffer.compare(served.body as Buffer, png)).toBe(0);
  });

  it('stores a real JPEG, and a new image replaces the old one on disk and in the table', async () => {
    const before = await uploadRows(companyId);
    expect(before).toHaveLength(1);
    const res = await uploadFile(team.office.client, url, jpegImage(16, 8), 'photo.jpeg', {
      contentType: 'image/jpeg',
    }).expect(201);
    expect(res.body.data).toMatchObject({ contentType: 'image/jpeg', widthPx: 16, heightPx: 8 });
    const after = await uploadRows(companyId);
    expect(after).toEqual([{ id: res.body.data.uploadId }]);
    expect(await storedFilesOf(companyId)).toEqual([res.body.data.uploadId]);
    const served = await team.owner.client.get(url).buffer(true).expect(200);
    expect(served.headers['content-type']).toBe('image/jpeg');
    expect(served.headers['content-disposition']).toBe('inline; filename="photo.jpg"');
  });
});
