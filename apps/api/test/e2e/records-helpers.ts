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
