import sharp from 'sharp';
import { ReportsService } from '../../src/reports';
import { MediaDerivativesService } from '../../src/media';
import { TASK_RUNNER, type TaskRunner } from '../../src/infra/tasks';
import { DEMO, type SignedIn, type TestApp } from '../test-app';

/** An invented owner whose name needs glyphs outside Latin-1 (ő, ł, ş). */
export const OWNER = 'Zsófia Kőrösi-Łęcka Şahin';

export const FINDINGS = {
  brake: 'Front brake lever reaches the bar under a hard pull.',
  chain: 'Chain at 0.8 % elongation, past the 0.5 % limit for 11-speed.',
} as const;

/** A photo with some texture, so its JPEG is a realistic size (not one flat colour). */
export async function photo(seed: number, width = 1600, height = 1200): Promise<Buffer> {
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}">
    <defs><linearGradient id="g" x1="0" x2="1" y1="0" y2="1"><stop offset="0" stop-color="hsl(${(seed * 47) % 360},45%,35%)"/><stop offset="1" stop-color="hsl(${(seed * 47 + 120) % 360},40%,70%)"/></linearGradient></defs>
    <rect width="100%" height="100%" fill="url(#g)"/>
    ${Array.from({ length: 40 }, (_, i) => `<circle cx="${(i * 137 + seed * 31) % width}" cy="${(i * 89 + seed * 17) % height}" r="${20 + ((i * seed) % 60)}" fill="hsl(${(i * 29 + seed) % 360},50%,50%)" fill-opacity="0.5"/>`).join('')}
  </svg>`;
  return sharp(Buffer.from(svg)).jpeg({ quality: 90 }).toBuffer();
}

/** Waits until derivatives and report renders have finished (no timing involved). */
export async function settled(t: TestApp): Promise<void> {
  await t.app.get(MediaDerivativesService).settled();
  await t.app.get<TaskRunner>(TASK_RUNNER).settled();
}

async function upload(m: SignedIn, jobId: number, img: Buffer, fields: Record<string, string>): Promise<number> {
  const req = m.agent.post(`/api/jobs/${jobId}/media`).attach('files', img, { filename: 'shot.jpg', contentType: 'image/jpeg' });
  for (const [k, v] of Object.entries(fields)) void req.field(k, v);
  const res = await req;
  if (res.status !== 201) throw new Error(`upload ${res.status} ${JSON.stringify(res.body)}`);
  return (res.body as { results: { asset: { id: number } }[] }).results[0].asset.id;
}

function ok(res: { status: number; body: unknown }, what: string): unknown {
  if (res.status >= 300) throw new Error(`${what}: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body;
}

/**
 * A job with an unsafe brake finding whose safety work the owner declined, a worn
 * chain with approved work, `photos` shots spread over the two findings, a scope
 * still, work and a torque entry. Returns ids and what the PDF must show.
 */
export async function jobWithRecords(t: TestApp, photos = 3) {
  const m = await t.signIn(DEMO.manager);
  const job = ok(
    await m.agent.post('/api/jobs').send({
      newCustomer: { name: OWNER, email: 'zsofia@example.test', phone: null, preferredChannel: 'email', notes: null },
      newBike: {
        maker: 'Quillon Works',
        model: 'Stratus 11',
        year: 2022,
        frameMaterial: 'aluminium',
        size: 'M',
        colour: 'Slate',
        serialNumber: 'QW-RPT-1',
        drivetrainSpeeds: 11,
        brakeType: 'hydraulic_disc',
        cableRouting: 'internal',
        dropoutType: 'vertical',
        tyreSize: '28-622',
      },
      reportedSymptoms: 'Brakes feel weak; chain skips.',
      promisedOn: '2030-01-10',
    }),
    'book-in',
  ) as { id: number; number: string };
  const base = `/api/jobs/${job.id}`;
  const brake = ok(await m.agent.post(`${base}/findings`).send({ area: 'brakes', condition: 'unsafe', description: FINDINGS.brake }), 'finding') as {
    id: number;
  };
  const chain = ok(await m.agent.post(`${base}/findings`).send({ area: 'drivetrain', condition: 'worn', description: FINDINGS.chain }), 'finding') as {
    id: number;
  };
  const brakeRec = ok(
    await m.agent.post(`${base}/findings/${brake.id}/recommendation`).send({
      summary: 'Bleed front brake and fit new pads',
      urgency: 'safety',
      parts: [{ description: 'Disc pads', qty: 1, unitPriceMinor: 1899 }],
      labourHundredths: 50,
    }),
    'rec',
  ) as { id: number };
  const chainRec = ok(
    await m.agent
      .post(`${base}/findings/${chain.id}/recommendation`)
      .send({ summary: 'Replace chain', urgency: 'soon', parts: [{ description: 'Chain, 11-speed', qty: 1, unitPriceMinor: 3499 }], labourHundredths: 25 }),
    'rec',
  ) as { id: number };
  ok(await m.agent.post(`${base}/recommendations/${brakeRec.id}/decision`).send({ status: 'declined', channel: 'phone', decidedByName: OWNER }), 'decline');
  ok(await m.agent.post(`${base}/recommendations/${chainRec.id}/decision`).send({ status: 'approved', channel: 'phone', decidedByName: OWNER }), 'approve');
  const shots: number[] = [];
  for (let i = 0; i < photos; i++)
    shots.push(await upload(m, job.id, await photo(i + 1), { phase: 'before', area: i % 2 ? 'drivetrain' : 'brakes', caption: `Shot ${i + 1}` }));
  const scope = await upload(m, job.id, await photo(99, 1280, 720), { phase: 'during', area: 'frame_fork', source: 'scope', caption: 'Down tube, inside' });
  const half = Math.ceil(shots.length / 2);
  ok(await m.agent.put(`${base}/findings/${brake.id}/media`).send({ assetIds: shots.slice(0, half) }), 'link');
  ok(await m.agent.put(`${base}/findings/${chain.id}/media`).send({ assetIds: shots.slice(half) }), 'link');
  ok(await m.agent.post(`${base}/work-entries`).send({ description: 'Fitted new 11-speed chain', partsUsed: 'Chain, 11-speed', minutes: 20 }), 'work');
  ok(
    await m.agent.post(`${base}/torque-entries`).send({
      fastener: 'Stem steerer clamp bolts',
      specified: { min: 5, max: null, unit: 'nm' },
      applied: { value: 5, unit: 'nm' },
      specSource: "Component maker's printed value",
      tool: 'Click wrench 2–24 N·m',
      toolCalibratedOn: '2025-06-01',
    }),
    'torque',
  );
  await settled(t);
  return { m, job, shots: [...shots, scope], base };
}

export const reportsService = (t: TestApp) => t.app.get(ReportsService);
