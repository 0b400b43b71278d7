import { ErrorBodySchema } from '@benchproof/contracts';
import { DEMO_PASSWORD } from '@benchproof/seeds';
import { bookJob } from '../media/media-fixtures';
import { DEMO, startTestApp, type TestApp } from '../test-app';

const b64 = (s: string) => Buffer.from(s).toString('base64');

/** Every error, tus included, is `{code, message, details}` with a code that says what happened. */
describe('one error shape everywhere', () => {
  let t: TestApp;
  let tus: Record<string, string>;
  let meta: string;
  beforeAll(async () => {
    t = await startTestApp({ APP_ORIGIN: 'https://bench.example' });
    const login = await t.http().post('/api/auth/login').send({ email: DEMO.mechanic, password: DEMO_PASSWORD }).expect(200);
    const cookie = (login.headers['set-cookie'] as unknown as string[]).map((c) => c.split(';')[0]).join('; ');
    tus = { 'Tus-Resumable': '1.0.0', Cookie: cookie, 'x-csrf-token': login.body.csrfToken as string };
    meta = `jobId ${b64(String(await bookJob(t)))},phase ${b64('before')},area ${b64('drivetrain')}`;
  });
  afterAll(() => t.close());

  const jsonError = (text: string) => ErrorBodySchema.parse(JSON.parse(text));

  it('answers an oversized JSON body with 413 BODY_TOO_LARGE, not a file error', async () => {
    const res = await t
      .http()
      .post('/api/auth/login')
      .set('Content-Type', 'application/json')
      .send(JSON.stringify({ email: 'a@b.test', password: 'x'.repeat(2_000_000) }))
      .expect(413);
    expect(res.body).toEqual({ code: 'BODY_TOO_LARGE', message: 'The request is too large.', details: { limitBytes: expect.any(Number) } });
  });

  it('answers malformed JSON with the JSON shape too', async () => {
    const res = await t.http().post('/api/auth/login').set('Content-Type', 'application/json').send('{"email": ').expect(400);
    expect(jsonError(JSON.stringify(res.body)).code).toBe('VALIDATION_FAILED');
  });

  it('answers a tus request without Tus-Resumable with JSON TUS_VERSION_REQUIRED', async () => {
    const { 'Tus-Resumable': _version, ...noVersion } = tus;
    const res = await t.http().post('/api/media/tus').set(noVersion).set('Upload-Length', '10').set('Upload-Metadata', meta).expect(412);
    expect(res.headers['content-type']).toMatch(/^application\/json/);
    expect(jsonError(res.text).code).toBe('TUS_VERSION_REQUIRED');
  });

  it('answers a wrong offset with JSON UPLOAD_OFFSET_CONFLICT and a missing length with TUS_HEADER_INVALID', async () => {
    const created = await t.http().post('/api/media/tus').set(tus).set('Upload-Length', '10').set('Upload-Metadata', meta).expect(201);
    const conflict = await t
      .http()
      .patch(created.headers.location)
      .set(tus)
      .set('Upload-Offset', '5')
      .set('Content-Type', 'application/offset+octet-stream')
      .send(Buffer.alloc(5))
      .expect(409);
    expect(jsonError(conflict.text)).toMatchObject({ code: 'UPLOAD_OFFSET_CONFLICT', details: { tus: 'Upload-Offset conflict' } });
    const noLength = await t.http().post('/api/media/tus').set(tus).set('Upload-Metadata', meta).expect(400);
    expect(jsonError(noLength.text).code).toBe('TUS_HEADER_INVALID');
    const tooBig = await t
      .http()
      .post('/api/media/tus')
      .set(tus)
      .set('Upload-Length', String(t.cfg.MAX_VIDEO_BYTES + 1))
      .set('Upload-Metadata', meta)
      .expect(413);
    expect(jsonError(tooBig.text).code).toBe('FILE_TOO_LARGE');
  });

  it('keeps the validation error of the metadata hook as it is', async () => {
    const res = await t
      .http()
      .post('/api/media/tus')
      .set(tus)
      .set('Upload-Length', '10')
      .set('Upload-Metadata', `phase ${b64('before')}`)
      .expect(400);
    expect(jsonError(res.text).code).toBe('VALIDATION_FAILED');
  });

  it('allows only the app origin cross-origin on the tus route, never *', async () => {
    const foreign = await t.http().options('/api/media/tus').set('Origin', 'https://evil.example').set('Access-Control-Request-Method', 'POST');
    expect(foreign.headers['access-control-allow-origin']).toBeUndefined();
    const foreignPost = await t
      .http()
      .post('/api/media/tus')
      .set(tus)
      .set('Origin', 'https://evil.example')
      .set('Upload-Length', '10')
      .set('Upload-Metadata', meta);
    expect(foreignPost.headers['access-control-allow-origin']).toBeUndefined();
    const own = await t
      .http()
      .post('/api/media/tus')
      .set(tus)
      .set('Origin', 'https://bench.example')
      .set('Upload-Length', '10')
      .set('Upload-Metadata', meta)
      .expect(201);
    expect(own.headers['access-control-allow-origin']).toBe('https://bench.example');
  });
});
