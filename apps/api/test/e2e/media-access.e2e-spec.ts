import { createHash } from 'node:crypto';
import { binary, bookJob, derivativesSettled, patternBytes, solidJpeg, paddedMp4, CLIP_MP4 } from '../media/media-fixtures';
import { DEMO, startTestApp, type SignedIn, type TestApp } from '../test-app';

/** A supertest agent indexed by HTTP verb, so one loop can call every route of the table. */
type AnyVerb = Record<string, (p: string) => { send: (b?: object) => Promise<{ status: number }> }>;

describe('media serving, ranges, tags, delete/purge and shop isolation', () => {
  let t: TestApp;
  let mech: SignedIn;
  let jobId: number;
  let video: Buffer;
  let videoAsset: { id: number; sha256: string; urls: Record<string, string | null> };
  let photo: { id: number; urls: Record<string, string | null> };
  beforeAll(async () => {
    t = await startTestApp();
    mech = await t.signIn(DEMO.mechanic);
    jobId = await bookJob(t);
    video = paddedMp4(patternBytes(50_000));
    const res = await mech.agent
      .post(`/api/jobs/${jobId}/media`)
      .field('phase', 'before')
      .field('area', 'frame_interior')
      .field('source', 'scope')
      .attach('files', video, 'scope.mp4')
      .attach('files', await solidJpeg(200, 100), 'a.jpg')
      .expect(201);
    [videoAsset, photo] = res.body.assets;
    await derivativesSettled(t);
  });
  afterAll(() => t.close());

  const get = (path: string, range?: string) => {
    const req = mech.agent.get(path).buffer(true).parse(binary);
    return range ? req.set('Range', range) : req;
  };

  it('probes the video and serves it whole with type, private caching and the SHA-256 as ETag', async () => {
    expect(videoAsset).toMatchObject({
      kind: 'scope_video',
      mime: 'video/mp4',
      durationMs: CLIP_MP4.durationMs,
      width: CLIP_MP4.width,
      height: CLIP_MP4.height,
      status: 'ready',
    });
    const res = await get(videoAsset.urls.original!).expect(200);
    expect(res.headers['content-type']).toBe('video/mp4');
    expect(res.headers['cache-control']).toMatch(/^private/);
    expect(res.headers.etag).toBe(`"${videoAsset.sha256}"`);
    expect(res.headers['accept-ranges']).toBe('bytes');
    expect(
      createHash('sha256')
        .update(res.body as Buffer)
        .digest('hex'),
    ).toBe(createHash('sha256').update(video).digest('hex'));
    await mech.agent.get(videoAsset.urls.original!).set('If-None-Match', `"${videoAsset.sha256}"`).expect(304);
  });

  // RFC 9110 §14.1.2 range forms, §14.4 Content-Range, §15.3.7 206, §15.5.17 416.
  it.each([
    ['bytes=0-99', 0, 99],
    ['bytes=1000-', 1000, -1],
    ['bytes=-500', -500, -1],
    ['bytes=40000-9999999', 40000, -1],
  ])('answers %s with 206 and exactly those bytes', async (range, start, end) => {
    const from = start < 0 ? video.length + start : start;
    const to = end < 0 ? video.length - 1 : end;
    const res = await get(videoAsset.urls.original!, range).expect(206);
    expect(res.headers['content-range']).toBe(`bytes ${from}-${to}/${video.length}`);
    expect(Number(res.headers['content-length'])).toBe(to - from + 1);
    expect((res.body as Buffer).equals(video.subarray(from, to + 1))).toBe(true);
  });

  it('answers an unsatisfiable range with 416 and the size', async () => {
    const res = await get(videoAsset.urls.original!, `bytes=${video.length}-`).expect(416);
    expect(res.headers['content-range']).toBe(`bytes */${video.length}`);
  });

  it('serves a screen derivative again and again with the same bytes, its SHA-256 as ETag, ranges and 304', async () => {
    const listed = await mech.agent.get(`/api/jobs/${jobId}/media`).expect(200);
    const items = (listed.body.items ?? listed.body) as { id: number; urls: Record<string, string | null> }[];
    const screen = items.find((m) => m.id === photo.id)!.urls.screen!;
    const first = await get(screen).expect(200);
    const bytes = first.body as Buffer;
    expect(first.headers['content-type']).toBe('image/jpeg');
    expect(first.headers.etag).toBe(`"${createHash('sha256').update(bytes).digest('hex')}"`);
    const again = await get(screen).expect(200);
    expect((again.body as Buffer).equals(bytes)).toBe(true);
    const part = await get(screen, 'bytes=2-9').expect(206);
    expect(part.headers['content-range']).toBe(`bytes 2-9/${bytes.length}`);
    expect((part.body as Buffer).equals(bytes.subarray(2, 10))).toBe(true);
    await get(screen, `bytes=${bytes.length}-`).expect(416);
    await mech.agent.get(screen).set('If-None-Match', first.headers.etag).expect(304);
  });

  it('takes a poster frame from the browser for a video and makes its thumb', async () => {
    expect(videoAsset.urls.poster).toBeNull();
    const res = await mech.agent
      .put(`/api/jobs/${jobId}/media/${videoAsset.id}/poster`)
      .attach('file', await solidJpeg(640, 480, '#204060'), 'frame.jpg')
      .expect(200);
    expect(res.body.urls).toMatchObject({ poster: `/api/media/${videoAsset.id}/poster`, thumb: `/api/media/${videoAsset.id}/thumb` });
    expect((await get(res.body.urls.poster).expect(200)).headers['content-type']).toBe('image/jpeg');
    const bad = await mech.agent.put(`/api/jobs/${jobId}/media/${videoAsset.id}/poster`).attach('file', Buffer.from('nope'), 'frame.jpg').expect(415);
    expect(bad.body.code).toBe('UNSUPPORTED_MEDIA_TYPE');
  });

  it('keeps a still grabbed from the scope video with its source and time code', async () => {
    const res = await mech.agent
      .post(`/api/jobs/${jobId}/media`)
      .field('phase', 'before')
      .field('area', 'frame_interior')
      .field('source', 'scope')
      .field('sourceAssetId', String(videoAsset.id))
      .field('timecodeMs', '1240')
      .attach('files', await solidJpeg(160, 120, '#6a4a2a'), 'still.jpg')
      .expect(201);
    expect(res.body.assets[0]).toMatchObject({ kind: 'scope_still', sourceAssetId: videoAsset.id, timecodeMs: 1240 });
  });

  it('filters and re-tags in bulk and one by one', async () => {
    const scope = (await mech.agent.get(`/api/jobs/${jobId}/media?kind=scope_video`).expect(200)).body;
    expect(scope.map((a: { id: number }) => a.id)).toEqual([videoAsset.id]);
    const bulk = await mech.agent
      .patch(`/api/jobs/${jobId}/media`)
      .send({ ids: [videoAsset.id, photo.id], phase: 'during' })
      .expect(200);
    expect(bulk.body.map((a: { phase: string }) => a.phase)).toEqual(['during', 'during']);
    const one = await mech.agent.patch(`/api/jobs/${jobId}/media/${photo.id}`).send({ area: 'bearings', caption: 'Cup pitting' }).expect(200);
    expect(one.body).toMatchObject({ phase: 'during', area: 'bearings', caption: 'Cup pitting' });
    expect((await mech.agent.get(`/api/jobs/${jobId}/media?area=bearings`).expect(200)).body).toHaveLength(1);
    expect(
      (
        await mech.agent
          .patch(`/api/jobs/${jobId}/media`)
          .send({ ids: [photo.id, 999999], phase: 'after' })
          .expect(404)
      ).body.details.missing,
    ).toEqual([999999]);
  });

  it('links shots to a finding in the chosen order, only live media of the same job', async () => {
    const finding = (
      await mech.agent
        .post(`/api/jobs/${jobId}/findings`)
        .send({ area: 'frame_interior', condition: 'worn', description: 'Rust spots inside the seat tube' })
        .expect(201)
    ).body;
    const path = `/api/jobs/${jobId}/findings/${finding.id}/media`;
    const linked = await mech.agent
      .put(path)
      .send({ assetIds: [photo.id, videoAsset.id] })
      .expect(200);
    expect(linked.body.assets.map((a: { id: number }) => a.id)).toEqual([photo.id, videoAsset.id]);
    expect((await mech.agent.get(path).expect(200)).body.assets.map((a: { id: number }) => a.id)).toEqual([photo.id, videoAsset.id]);
    const otherJob = await bookJob(t);
    const res = await mech.agent
      .put(`/api/jobs/${otherJob}/findings/${finding.id}/media`)
      .send({ assetIds: [photo.id] })
      .expect(404);
    expect(res.body.code).toBe('NOT_FOUND');
    const foreign = await mech.agent
      .put(path)
      .send({ assetIds: [999999] })
      .expect(400);
    expect(foreign.body.details.missing).toEqual([999999]);
    const other = await t.signIn(DEMO.otherShopManager);
    await other.agent.get(path).expect(404);
    await other.agent.put(path).send({ assetIds: [] }).expect(404);
  });

  it('gives another shop 404 on every media route and file, and nothing without a session', async () => {
    const other = await t.signIn(DEMO.otherShopManager);
    const id = photo.id;
    const routes: [string, string, object?][] = [
      ['get', `/api/jobs/${jobId}/media`],
      ['get', `/api/jobs/${jobId}/media/${id}`],
      ['patch', `/api/jobs/${jobId}/media/${id}`, { caption: 'x' }],
      ['patch', `/api/jobs/${jobId}/media`, { ids: [id], caption: 'x' }],
      ['delete', `/api/jobs/${jobId}/media/${id}`],
      ['post', `/api/media/${id}/purge`],
      ...(['original', 'thumb', 'screen', 'print'] as const).map((v): [string, string] => ['get', `/api/media/${id}/${v}`]),
      ['get', `/api/media/${videoAsset.id}/poster`],
    ];
    for (const [method, path, body] of routes) {
      const res = await (other.agent as unknown as AnyVerb)[method](path).send(body);
      expect({ method, path, status: res.status }).toEqual({ method, path, status: 404 });
      const anon = await (t.http() as unknown as AnyVerb)[method](path).send(body);
      expect({ method, path, status: anon.status }).toEqual({ method, path, status: 401 });
    }
  });

  it('serves nothing from uploads/ by a guessable path', async () => {
    const stored = t.storedFiles();
    expect(stored.length).toBeGreaterThan(0);
    for (const p of stored.slice(0, 5)) {
      for (const url of [`/uploads${p}`, p, `/api/uploads${p}`]) expect((await mech.agent.get(url)).status).toBe(404);
    }
  });

  it('soft-deletes with an audit event, keeps the files, and lets only a manager purge them', async () => {
    const manager = await t.signIn(DEMO.manager);
    const keysBefore = t.storedFiles().length;
    await mech.agent.delete(`/api/jobs/${jobId}/media/${photo.id}`).expect(204);
    expect((await mech.agent.get(`/api/jobs/${jobId}/media`).expect(200)).body.map((a: { id: number }) => a.id)).not.toContain(photo.id);
    await mech.agent.get(`/api/media/${photo.id}/original`).expect(404);
    const listed = (await manager.agent.get(`/api/jobs/${jobId}/media?includeDeleted=true`).expect(200)).body;
    expect(listed.find((a: { id: number }) => a.id === photo.id).deletedAt).toEqual(expect.any(String));
    expect(t.storedFiles().length).toBe(keysBefore);
    expect((await mech.agent.post(`/api/media/${photo.id}/purge`).expect(403)).body.code).toBe('FORBIDDEN');
    expect((await manager.agent.post(`/api/media/${videoAsset.id}/purge`).expect(409)).body.code).toBe('CONFLICT');
    await manager.agent.post(`/api/media/${photo.id}/purge`).expect(204);
    expect(t.storedFiles().length).toBe(keysBefore - 4);
    await manager.agent.get(`/api/media/${photo.id}/original`).expect(404);
    const audit = (await manager.agent.get(`/api/audit?entityType=media_asset&entityId=${photo.id}`).expect(200)).body as { action: string }[];
    expect(audit.map((e) => e.action)).toEqual(expect.arrayContaining(['media.uploaded', 'media.retagged', 'media.deleted', 'media.purged']));
  });
});
