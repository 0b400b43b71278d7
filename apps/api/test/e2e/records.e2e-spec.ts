import { CARBON_CAUTION, TORQUE_CAUTION } from '@benchproof/domain';
import { DEMO, startTestApp, type TestApp } from '../test-app';
import { ALL_PASS } from '../support/final-check';
import { bookIn } from './records-helpers';

describe('records: measurements, estimate, decisions, torque', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
  });
  afterAll(() => t.close());

  async function chainCheckpoint(jobId: number, agent: Awaited<ReturnType<TestApp['signIn']>>['agent']): Promise<number> {
    const insp = (await agent.get(`/api/jobs/${jobId}/inspection`).expect(200)).body;
    const drivetrain = insp.areas.find((a: { area: string }) => a.area === 'drivetrain');
    return (drivetrain.checkpoints as { key: string; id: number }[]).find((c) => c.key === 'chain_wear')!.id;
  }

  it('gives replace_chain for a 0.8 % gauge reading on an 11-speed bike, stores it, and previews without storing', async () => {
    const desk = await t.signIn(DEMO.desk);
    const mech = await t.signIn(DEMO.mechanic);
    const job = await bookIn(desk);
    const cp = await chainCheckpoint(job.id, mech.agent);
    // CHECKS.md B.1: 11/12-speed replace at 0.5 % (common practice); 0.8 % is past it and below the 1.0 % cassette mark.
    const preview = (
      await mech.agent.post(`/api/jobs/${job.id}/measurements/preview`).send({ kind: 'chain_elongation', method: 'gauge', gaugePct: 0.8 }).expect(200)
    ).body;
    expect(preview).toMatchObject({ condition: 'worn', verdict: 'replace_chain' });
    expect(
      (await mech.agent.get(`/api/jobs/${job.id}/inspection`).expect(200)).body.areas.flatMap((a: { checkpoints: { measurements: unknown[] }[] }) =>
        a.checkpoints.flatMap((c) => c.measurements),
      ),
    ).toHaveLength(0);
    // Ruler over 24 pitches: 304.8 mm nominal (24 × 12.7 mm); 307.24 mm → 0.8005 % (by hand).
    const m = (
      await mech.agent
        .post(`/api/jobs/${job.id}/checkpoints/${cp}/measurements`)
        .send({ kind: 'chain_elongation', method: 'ruler', pitches: 24, lengthValue: 307.24, lengthUnit: 'mm' })
        .expect(201)
    ).body;
    expect(m.result).toMatchObject({ condition: 'worn', verdict: 'replace_chain' });
    const insp = (await mech.agent.get(`/api/jobs/${job.id}/inspection`).expect(200)).body;
    const chain = insp.areas.find((a: { area: string }) => a.area === 'drivetrain').checkpoints.find((c: { id: number }) => c.id === cp);
    expect(chain.condition).toBe('worn');
    expect(chain.measurements).toHaveLength(1);
    const bad = await mech.agent
      .post(`/api/jobs/${job.id}/checkpoints/${cp}/measurements`)
      .send({ kind: 'pad_thickness', mm: 1, minimumMm: 0.5, position: 'front' });
    expect(bad.status).toBe(400);
    await mech.agent.delete(`/api/jobs/${job.id}/measurements/${m.id}`).expect(204);
  });

  it('prices an estimate in exact minor units and records the owner decision', async () => {
    const desk = await t.signIn(DEMO.desk);
    const mech = await t.signIn(DEMO.mechanic);
    const job = await bookIn(desk);
    const f = (
      await mech.agent.post(`/api/jobs/${job.id}/findings`).send({ area: 'drivetrain', condition: 'worn', description: 'Chain past its limit' }).expect(201)
    ).body;
    // Demo shop: labour 6000 (£60.00/h), tax 2000 bp (20 %). Worked by hand:
    // chain 1 × 2999 = 2999; housing 1.5 × 450 = 675; labour 0.75 h × 6000 = 4500;
    // net 2999 + 675 + 4500 = 8174; tax 8174 × 20 % = 1634.8 → 1635 (half up, libs/domain roundMinor); gross 9809.
    const rec = (
      await desk.agent
        .post(`/api/jobs/${job.id}/findings/${f.id}/recommendation`)
        .send({
          summary: 'Replace chain',
          parts: [
            { description: 'Chain 11-speed', qty: 1, unitPriceMinor: 2999 },
            { description: 'Gear housing (m)', qty: 1.5, unitPriceMinor: 450 },
          ],
          labourHundredths: 75,
        })
        .expect(201)
    ).body;
    expect(rec.totals).toEqual({ partsMinor: 3674, labourMinor: 4500, netMinor: 8174, taxMinor: 1635, grossMinor: 9809 });
    expect(rec.decisionStatus).toBe('pending');
    let est = (await desk.agent.get(`/api/jobs/${job.id}/estimate`).expect(200)).body;
    expect(est.totals.pending.grossMinor).toBe(9809);
    expect(est.totals.approved.grossMinor).toBe(0);
    expect(
      (
        await mech.agent
          .post(`/api/jobs/${job.id}/recommendations/${rec.id}/decision`)
          .send({ status: 'approved', channel: 'phone', decidedByName: 'Ottilie Fernsby' })
      ).status,
    ).toBe(403);
    const d = (
      await desk.agent
        .post(`/api/jobs/${job.id}/recommendations/${rec.id}/decision`)
        .send({ status: 'approved', channel: 'phone', decidedByName: 'Ottilie Fernsby', decidedAt: '2029-12-01T10:30:00.000Z' })
        .expect(201)
    ).body;
    expect(d).toMatchObject({
      status: 'approved',
      channel: 'phone',
      decidedByName: 'Ottilie Fernsby',
      recordedById: desk.user.id,
      decidedAt: '2029-12-01T10:30:00.000Z',
    });
    est = (await desk.agent.get(`/api/jobs/${job.id}/estimate`).expect(200)).body;
    expect(est.totals.approved.grossMinor).toBe(9809);
    expect(est.totals.pending.grossMinor).toBe(0);
  });

  it('computes torque verdicts with the caution, and the carbon caution for carbon parts', async () => {
    const desk = await t.signIn(DEMO.desk);
    const mech = await t.signIn(DEMO.mechanic);
    const job = await bookIn(desk);
    const base = { fastener: 'Stem steerer bolts', specSource: "Printed on the stem (maker's value)", tool: 'Click wrench 2–24 N·m' };
    // 5 N·m single value, ±6 % below 10 N·m (domain defaultTorqueTolerancePct): 4.7–5.3 N·m.
    const ok = (
      await mech.agent
        .post(`/api/jobs/${job.id}/torque-entries`)
        .send({ ...base, specified: { min: 5, unit: 'nm' }, applied: { value: 5.2, unit: 'nm' }, carbonPart: true })
        .expect(201)
    ).body;
    expect(ok).toMatchObject({ verdict: 'within', withinTolerance: true });
    expect(ok.cautions).toEqual([TORQUE_CAUTION, CARBON_CAUTION]);
    // 50 lbf·in × 0.1129848 N·m (NIST SP 811) = 5.649 N·m: over the 5.3 N·m band edge.
    const over = (
      await mech.agent
        .post(`/api/jobs/${job.id}/torque-entries`)
        .send({ ...base, specified: { min: 5, unit: 'nm' }, applied: { value: 50, unit: 'lbf_in' } })
        .expect(201)
    ).body;
    expect(over.verdict).toBe('over');
    expect(over.appliedNm).toBeCloseTo(5.649, 3);
    expect(over.cautions).toEqual([TORQUE_CAUTION]);
    expect(
      (
        await mech.agent
          .post(`/api/jobs/${job.id}/torque-entries`)
          .send({ ...base, specSource: '', specified: { min: 5, unit: 'nm' }, applied: { value: 5, unit: 'nm' } })
      ).status,
    ).toBe(400);
    const list = (await mech.agent.get(`/api/jobs/${job.id}/torque-entries`).expect(200)).body;
    expect(list).toHaveLength(2);
    const w = (
      await mech.agent.post(`/api/jobs/${job.id}/work-entries`).send({ description: 'Fitted new chain', partsUsed: 'Chain 11-speed', minutes: 20 }).expect(201)
    ).body;
    await mech.agent.delete(`/api/jobs/${job.id}/work-entries/${w.id}`).expect(204);
  });

  it('answers 404 NOT_FOUND to another shop on every records route', async () => {
    const desk = await t.signIn(DEMO.desk);
    const mech = await t.signIn(DEMO.mechanic);
    const job = await bookIn(desk);
    const cp = await chainCheckpoint(job.id, mech.agent);
    const f = (
      await mech.agent.post(`/api/jobs/${job.id}/findings`).send({ area: 'brakes', condition: 'unsafe', description: 'Pads to the backing plate' }).expect(201)
    ).body;
    expect(f.doNotRide).toBe(true);
    const rec = (
      await desk.agent.post(`/api/jobs/${job.id}/findings/${f.id}/recommendation`).send({ summary: 'Pads', parts: [], labourHundredths: 50 }).expect(201)
    ).body;
    const m = (
      await mech.agent.post(`/api/jobs/${job.id}/checkpoints/${cp}/measurements`).send({ kind: 'chain_elongation', method: 'gauge', gaugePct: 0.3 }).expect(201)
    ).body;
    const w = (await mech.agent.post(`/api/jobs/${job.id}/work-entries`).send({ description: 'x', minutes: 5 }).expect(201)).body;
    const other = await t.signIn(DEMO.otherShopManager);
    const j = `/api/jobs/${job.id}`;
    const customer = { name: 'X', email: 'x@example.test', preferredChannel: 'email' };
    const calls: [string, string, unknown?][] = [
      ['get', `/api/customers/${job.customer.id}`],
      ['patch', `/api/customers/${job.customer.id}`, customer],
      ['get', `/api/customers/${job.customer.id}/bikes`],
      ['get', `/api/bikes/${job.bike.id}`],
      ['get', `/api/bikes/${job.bike.id}/history`],
      [
        'patch',
        `/api/bikes/${job.bike.id}`,
        {
          customerId: job.customer.id,
          maker: 'A',
          model: 'B',
          frameMaterial: 'steel',
          drivetrainSpeeds: 9,
          brakeType: 'rim',
          cableRouting: 'external',
          dropoutType: 'vertical',
        },
      ],
      ['get', j],
      ['patch', j, { reportedSymptoms: 'x' }],
      ['post', `${j}/transitions`, { to: 'on_stand' }],
      ['get', `${j}/events`],
      ['get', `${j}/inspection`],
      ['patch', `${j}/checkpoints/${cp}`, { condition: 'sound' }],
      ['post', `${j}/checkpoints/${cp}/measurements`, { kind: 'chain_elongation', method: 'gauge', gaugePct: 0.3 }],
      ['post', `${j}/measurements/preview`, { kind: 'chain_elongation', method: 'gauge', gaugePct: 0.3 }],
      ['delete', `${j}/measurements/${m.id}`],
      ['get', `${j}/findings`],
      ['post', `${j}/findings`, { area: 'brakes', condition: 'worn', description: 'x' }],
      ['patch', `${j}/findings/${f.id}`, { description: 'y' }],
      ['delete', `${j}/findings/${f.id}`],
      ['post', `${j}/findings/${f.id}/recommendation`, { summary: 's', parts: [], labourHundredths: 1 }],
      ['get', `${j}/estimate`],
      ['post', `${j}/recommendations/${rec.id}/decision`, { status: 'approved', channel: 'phone', decidedByName: 'X' }],
      ['get', `${j}/work-entries`],
      ['post', `${j}/work-entries`, { description: 'x', minutes: 1 }],
      ['delete', `${j}/work-entries/${w.id}`],
      ['get', `${j}/torque-entries`],
      ['post', `${j}/torque-entries`, { fastener: 'x', specSource: 'maker', specified: { min: 5, unit: 'nm' }, applied: { value: 5, unit: 'nm' } }],
      [
        'post',
        `${j}/final-check`,
        {
          items: { ...ALL_PASS, test_ride: false },
          passed: false,
          note: 'x',
        },
      ],
    ];
    for (const [method, url, body] of calls) {
      const res = await other.agent[method as 'get'](url).send(body as object);
      expect({ route: `${method} ${url}`, status: res.status, code: res.body.code }).toEqual({ route: `${method} ${url}`, status: 404, code: 'NOT_FOUND' });
    }
    const lists = (await other.agent.get('/api/jobs?pageSize=100').expect(200)).body.items.map((x: { id: number }) => x.id);
    expect(lists).not.toContain(job.id);
  });
});
