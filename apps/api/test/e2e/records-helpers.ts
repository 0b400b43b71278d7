import type { SignedIn } from '../test-app';

/** A new customer and a new 11-speed bike booked in by the given desk/manager agent. */
export async function bookIn(s: SignedIn, overrides: Record<string, unknown> = {}) {
  const res = await s.agent.post('/api/jobs').send({
    newCustomer: { name: 'Ottilie Fernsby', email: 'ottilie@example.test', phone: null, preferredChannel: 'email', notes: null },
    newBike: {
      maker: 'Quillon Works',
      model: 'Stratus 11',
      year: 2022,
      frameMaterial: 'aluminium',
      size: 'M',
      colour: 'Slate',
      serialNumber: 'QW-TEST-1',
      drivetrainSpeeds: 11,
      brakeType: 'hydraulic_disc',
      cableRouting: 'internal',
      dropoutType: 'vertical',
      tyreSize: '28-622',
    },
    reportedSymptoms: 'Chain skips under load',
    promisedOn: '2030-01-10',
    ...overrides,
  });
  if (res.status !== 201) throw new Error(`book-in failed ${res.status} ${JSON.stringify(res.body)}`);
  return res.body as { id: number; number: string; customer: { id: number }; bike: { id: number }; status: string };
}

const FINAL_CHECK_PASSED = {
  items: {
    brakes: true,
    shifting: true,
    steering: true,
    fasteners_torqued: true,
    wheels_true_centred: true,
    tyres_pressure: true,
    axles_closed: true,
    test_ride: true,
  },
  passed: true,
};

/** Walks a booked-in job to ready: a manager moves it, a second mechanic passes the final check. */
export async function driveToReady(manager: SignedIn, checker: SignedIn, jobId: number): Promise<void> {
  for (const to of ['on_stand', 'in_work', 'final_check']) await manager.agent.post(`/api/jobs/${jobId}/transitions`).send({ to }).expect(200);
  await checker.agent.post(`/api/jobs/${jobId}/final-check`).send(FINAL_CHECK_PASSED).expect(201);
  await manager.agent.post(`/api/jobs/${jobId}/transitions`).send({ to: 'ready' }).expect(200);
}
