import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import S3rver from 's3rver';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Survey, UploadList } from '@keybed/shared';
import { createS3Storage } from '../src/lib/storage';
import { createJob } from './board-fixtures';
import { addMember, createTestApp, signUpWorkshop, type TestApp } from './helpers';
import { phonePhoto, smallPng } from './photo-fixtures';
import { ErrorBody } from './schemas';
import { componentOf, startSurvey } from './survey-fixtures';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp({ env: { UPLOAD_MAX_MB: '2', UPLOAD_MAX_FILES: '3' } });
});
afterAll(() => t.close());

/** Every file under a folder, so a refusal can prove nothing was written. */
function filesUnder(dir: string): string[] {
  if (!fs.existsSync(dir)) return [];
  return fs.readdirSync(dir, { recursive: true, withFileTypes: true }).filter((e) => e.isFile()).map((e) => path.join(e.parentPath, e.name));
}

/** form-data sends `filepath` as it is (its `filename` keeps only the last part); supertest's types omit it. */
const rawName = (filepath: string) => ({ filepath }) as unknown as { filename: string };

const rowsOf = async (workshopId: string) => (await t.sql`select count(*)::int as n from uploads where workshop_id = ${workshopId}`)[0]!.n as number;

async function surveyPhotoTarget(agent: ReturnType<TestApp['agent']>) {
  const survey = await startSurvey(agent);
  return { survey, component: componentOf(survey, 'hammers') };
}

describe('POST /api/uploads', () => {
  it('when a technician sends two phone photos for a survey component, then web copies and thumbnails are stored upright without GPS or other metadata', async () => {
    const { agent: owner } = await signUpWorkshop(t);
    const { agent: tech } = await addMember(t, owner, 'technician');
    const { survey, component } = await surveyPhotoTarget(owner);
    const res = await tech
      .post('/api/uploads')
      .field('surveyComponentId', component.id)
      .attach('files', await phonePhoto(), 'hammers-bass.jpg')
      .attach('files', await smallPng(), 'hammers-treble.png')
      .expect(201);
    const { uploads } = UploadList.parse(res.body);
    expect(uploads.map((u) => [u.sourceType, u.width, u.height])).toEqual([
      ['image/jpeg', 1200, 1600],
      ['image/png', 200, 120],
    ]);
    const web = (await tech.get(uploads[0]!.url).expect(200).expect('Content-Type', 'image/jpeg')).body as Buffer;
    const meta = await sharp(web).metadata();
    expect([meta.format, meta.width, meta.height, meta.exif, meta.xmp, meta.orientation]).toEqual(['jpeg', 1200, 1600, undefined, undefined, undefined]);
    const thumb = await sharp((await tech.get(uploads[0]!.thumbUrl).expect(200)).body as Buffer).metadata();
    expect([thumb.width, thumb.height, thumb.exif]).toEqual([240, 320, undefined]);
    const again = Survey.parse((await tech.get(`/api/surveys/${survey.id}`).expect(200)).body);
    expect(componentOf(again, 'hammers').photos.map((p) => p.id)).toEqual(uploads.map((u) => u.id));
    expect(filesUnder(t.uploadDir).every((f) => /[0-9a-f]{32}(-thumb)?\.jpg$/.test(f))).toBe(true);
  });

  it('when a non-image is renamed to .jpg, then 415 and nothing is written', async () => {
    const { agent, me } = await signUpWorkshop(t);
    const { component } = await surveyPhotoTarget(agent);
    const before = filesUnder(t.uploadDir).length;
    const res = await agent.post('/api/uploads').field('surveyComponentId', component.id).attach('files', Buffer.from('%PDF-1.4\nnot a photo at all\n'), 'hammers.jpg').expect(415);
    expect(ErrorBody.parse(res.body).error).toMatchObject({ code: 'unsupported_file', fields: { 'files.0': [expect.stringContaining('not a JPEG, PNG or WebP')] } });
    expect(filesUnder(t.uploadDir).length).toBe(before);
    expect(await rowsOf(me.workshop.id)).toBe(0);
  });

  it('when one good photo comes with one bad one, then the whole upload is refused and the good one is not kept either', async () => {
    const { agent, me } = await signUpWorkshop(t);
    const { component } = await surveyPhotoTarget(agent);
    const before = filesUnder(t.uploadDir).length;
    await agent
      .post('/api/uploads')
      .field('surveyComponentId', component.id)
      .attach('files', await smallPng(), 'good.png')
      .attach('files', Buffer.from([0xff, 0xd8, 0xff, 0xe0, 0x00, 0x10, 0x4a, 0x46, 0x49, 0x46, 0x00, 0x01, 0x02, 0x03]), 'truncated.jpg')
      .expect(415);
    expect(filesUnder(t.uploadDir).length).toBe(before);
    expect(await rowsOf(me.workshop.id)).toBe(0);
  });

  it('when a file is over the size limit, then 413 with the limit in words and nothing is written', async () => {
    const { agent, me } = await signUpWorkshop(t);
    const { component } = await surveyPhotoTarget(agent);
    const before = filesUnder(t.uploadDir).length;
    const big = Buffer.concat([await smallPng(), Buffer.alloc(2.5 * 1024 * 1024)]);
    const res = await agent.post('/api/uploads').field('surveyComponentId', component.id).attach('files', big, 'huge.png').expect(413);
    expect(ErrorBody.parse(res.body).error).toMatchObject({ code: 'payload_too_large', message: 'Each photo can be at most 2 MB' });
    expect(filesUnder(t.uploadDir).length).toBe(before);
    expect(await rowsOf(me.workshop.id)).toBe(0);
  });

  it('when more files than allowed are sent at once, then 413 and nothing is written', async () => {
    const { agent, me } = await signUpWorkshop(t);
    const { component } = await surveyPhotoTarget(agent);
    const png = await smallPng();
    let req = agent.post('/api/uploads').field('surveyComponentId', component.id);
    for (let i = 0; i < 4; i++) req = req.attach('files', png, `photo-${i}.png`);
    expect(ErrorBody.parse((await req.expect(413)).body).error.message).toBe('At most 3 photos at a time');
    expect(await rowsOf(me.workshop.id)).toBe(0);
  });

  it.each(['../../etc/passwd.jpg', '..\\..\\boot.ini.png', 'photos/../../escape.jpg'])('when the file name is %s, then 400 and nothing is written anywhere', async (name) => {
    const { agent, me } = await signUpWorkshop(t);
    const { component } = await surveyPhotoTarget(agent);
    const before = filesUnder(t.uploadDir).length;
    const res = await agent.post('/api/uploads').field('surveyComponentId', component.id).attach('files', await smallPng(), rawName(name)).expect(400);
    expect(ErrorBody.parse(res.body).error.fields).toHaveProperty(['files.0']);
    expect(filesUnder(t.uploadDir).length).toBe(before);
    expect(fs.existsSync(path.resolve(t.uploadDir, name.replaceAll('\\', '/')))).toBe(false);
    expect(await rowsOf(me.workshop.id)).toBe(0);
  });

  it('when the photos are for another workshop’s job, or for nothing, then 404 or 400 and nothing is written', async () => {
    const { agent, me } = await signUpWorkshop(t);
    const { agent: other } = await signUpWorkshop(t, 'other');
    const theirJob = await createJob(other);
    const before = filesUnder(t.uploadDir).length;
    await agent.post('/api/uploads').field('jobId', theirJob.id).attach('files', await smallPng(), 'case.png').expect(404);
    const none = await agent.post('/api/uploads').attach('files', await smallPng(), 'case.png').expect(400);
    expect(ErrorBody.parse(none.body).error.fields).toHaveProperty('surveyComponentId');
    expect(filesUnder(t.uploadDir).length).toBe(before);
    expect(await rowsOf(me.workshop.id)).toBe(0);
  });

  it('when a HEIC photo is sent, then 415 with what to do instead', async () => {
    const { agent } = await signUpWorkshop(t);
    const job = await createJob(agent);
    // The start of an HEIC file: an ISO-BMFF "ftyp" box with the heic brand.
    const heic = Buffer.concat([Buffer.from([0, 0, 0, 0x18]), Buffer.from('ftypheic'), Buffer.from([0, 0, 0, 0]), Buffer.from('mif1heic'), Buffer.alloc(64)]);
    const res = await agent.post('/api/uploads').field('jobId', job.id).attach('files', heic, 'IMG_0001.HEIC').expect(415);
    expect(ErrorBody.parse(res.body).error.message).toMatch(/HEIC.*export the photo as JPEG/);
  });
});

describe('GET /api/uploads/:id', () => {
  it('when another workshop asks for a photo by its id, then 404 and no bytes', async () => {
    const { agent } = await signUpWorkshop(t);
    const { agent: other } = await signUpWorkshop(t, 'other');
    const job = await createJob(agent);
    const { uploads } = UploadList.parse((await agent.post('/api/uploads').field('jobId', job.id).attach('files', await smallPng(), 'case.png').expect(201)).body);
    const res = await other.get(`/api/uploads/${uploads[0]!.id}`).expect(404);
    expect(ErrorBody.parse(res.body).error.code).toBe('not_found');
    await other.get(`/api/uploads/${uploads[0]!.id}?size=thumb`).expect(404);
    await t.request().get(`/api/uploads/${uploads[0]!.id}`).expect(401);
  });

  it('when a photo is deleted, then its files go too', async () => {
    const { agent } = await signUpWorkshop(t);
    const job = await createJob(agent);
    const before = filesUnder(t.uploadDir).length;
    const { uploads } = UploadList.parse((await agent.post('/api/uploads').field('jobId', job.id).attach('files', await smallPng(), 'case.png').expect(201)).body);
    expect(filesUnder(t.uploadDir).length).toBe(before + 2);
    await agent.delete(`/api/uploads/${uploads[0]!.id}`).expect(204);
    expect(filesUnder(t.uploadDir).length).toBe(before);
    await agent.get(`/api/uploads/${uploads[0]!.id}`).expect(404);
  });
});

describe('PATCH /api/uploads/:id', () => {
  it('when the owner shares a survey photo with the client, then it is marked; a technician may not, and a job photo cannot be shared', async () => {
    const { agent: owner } = await signUpWorkshop(t);
    const { agent: tech } = await addMember(t, owner, 'technician');
    const { component } = await surveyPhotoTarget(owner);
    const job = await createJob(owner);
    const survey = UploadList.parse((await tech.post('/api/uploads').field('surveyComponentId', component.id).attach('files', await smallPng(), 'a.png').expect(201)).body).uploads[0]!;
    const jobPhoto = UploadList.parse((await owner.post('/api/uploads').field('jobId', job.id).attach('files', await smallPng(), 'b.png').expect(201)).body).uploads[0]!;
    await tech.patch(`/api/uploads/${survey.id}`).send({ isSharedWithClient: true }).expect(403);
    expect((await owner.patch(`/api/uploads/${survey.id}`).send({ isSharedWithClient: true }).expect(200)).body).toMatchObject({ isSharedWithClient: true });
    await owner.patch(`/api/uploads/${jobPhoto.id}`).send({ isSharedWithClient: true }).expect(400);
  });
});

describe('S3-compatible storage', () => {
  let s3: S3rver;
  let s3Dir: string;
  let s3App: TestApp;
  let endpoint: string;
  const bucket = 'keybed-photos';

  beforeAll(async () => {
    s3Dir = fs.mkdtempSync(path.join(os.tmpdir(), 'keybed-s3-'));
    s3 = new S3rver({ address: '127.0.0.1', port: 0, silent: true, directory: s3Dir, configureBuckets: [{ name: bucket, configs: [] }] });
    const { port } = await s3.run();
    endpoint = `http://127.0.0.1:${port}`;
    s3App = await createTestApp({ env: { S3_ENDPOINT: endpoint, S3_BUCKET: bucket, S3_ACCESS_KEY_ID: 'S3RVER', S3_SECRET_ACCESS_KEY: 'S3RVER', UPLOAD_MAX_MB: '2' } });
  });
  afterAll(async () => {
    await s3App.close();
    await s3.close();
    fs.rmSync(s3Dir, { recursive: true, force: true });
  });

  const objectsInBucket = () => filesUnder(path.join(s3Dir, bucket)).filter((f) => !f.endsWith('._S3rver_metadata.json') && !f.endsWith('.md5'));

  it('when the adapter puts, gets and deletes an object, then the fake store holds it and then does not', async () => {
    const storage = createS3Storage({ endpoint, region: 'us-east-1', bucket, accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER', forcePathStyle: true });
    const key = '0b1d6c2e-5a4f-4c8e-9a51-7f3e2d1c0a01/0123456789abcdef0123456789abcdef.jpg';
    await storage.put(key, Buffer.from('jpeg bytes'), 'image/jpeg');
    expect((await storage.get(key))?.toString()).toBe('jpeg bytes');
    await storage.delete(key);
    expect(await storage.get(key)).toBeNull();
    await expect(storage.put('../outside.jpg', Buffer.from('x'), 'image/jpeg')).rejects.toThrow(/storage key/);
  });

  it('when the app is configured for S3, then photos go to the bucket, are served back, and a refused upload leaves the bucket as it was', async () => {
    const { agent } = await signUpWorkshop(s3App);
    const job = await createJob(agent);
    const { uploads } = UploadList.parse((await agent.post('/api/uploads').field('jobId', job.id).attach('files', await phonePhoto(800, 600), 'case.jpg').expect(201)).body);
    expect(objectsInBucket()).toHaveLength(2);
    expect(filesUnder(s3App.uploadDir)).toEqual([]);
    const meta = await sharp((await agent.get(uploads[0]!.thumbUrl).expect(200)).body as Buffer).metadata();
    expect([meta.width, meta.height, meta.exif]).toEqual([240, 320, undefined]);
    await agent.post('/api/uploads').field('jobId', job.id).attach('files', Buffer.from('GIF89a not really'), 'case.jpg').expect(415);
    await agent.post('/api/uploads').field('jobId', job.id).attach('files', await smallPng(), rawName('../case.png')).expect(400);
    expect(objectsInBucket()).toHaveLength(2);
  });
});
