import { BookInRequestSchema, FinalCheckRequestSchema, JobListQuerySchema, TransitionRequestSchema } from './jobs';

const newCustomer = { name: 'Rosa Vell', email: 'rosa@example.org', phone: '', preferredChannel: 'email', notes: '' };
const newBike = {
  maker: 'Harbour Cycles',
  model: 'Tern Road',
  frameMaterial: 'steel',
  drivetrainSpeeds: 9,
  brakeType: 'rim',
  cableRouting: 'external',
  dropoutType: 'horizontal',
};
const base = { reportedSymptoms: 'Skips in the smallest cog after rain', promisedOn: '2026-03-14' };

const paths = (value: unknown) => {
  const r = BookInRequestSchema.safeParse(value);
  return r.success ? [] : r.error.issues.map((i) => i.path.join('.'));
};

describe('BookInRequestSchema', () => {
  it('accepts an existing customer and bike, or new ones', () => {
    expect(paths({ ...base, customerId: 4, bikeId: 9 })).toEqual([]);
    expect(paths({ ...base, newCustomer, newBike })).toEqual([]);
    expect(paths({ ...base, customerId: 4, newBike, mechanicId: 2 })).toEqual([]);
  });

  it('needs exactly one of customerId/newCustomer and bikeId/newBike', () => {
    expect(paths({ ...base })).toEqual(['customerId', 'bikeId']);
    expect(paths({ ...base, customerId: 4, newCustomer, bikeId: 9 })).toContain('customerId');
  });

  it('a new customer cannot bring an existing bike', () => {
    expect(paths({ ...base, newCustomer, bikeId: 9 })).toEqual(['bikeId']);
  });

  it('needs symptoms (1–2000 characters) and an ISO date', () => {
    expect(paths({ ...base, reportedSymptoms: ' ', customerId: 4, bikeId: 9 })).toEqual(['reportedSymptoms']);
    expect(paths({ ...base, reportedSymptoms: 'x'.repeat(2001), customerId: 4, bikeId: 9 })).toEqual(['reportedSymptoms']);
    expect(paths({ ...base, promisedOn: '14/03/2026', customerId: 4, bikeId: 9 })).toEqual(['promisedOn']);
  });

  it('checks the nested new customer: e-mail channel needs an e-mail', () => {
    expect(paths({ ...base, newCustomer: { ...newCustomer, email: '' }, newBike })).toEqual(['newCustomer.email']);
  });
});

describe('JobListQuerySchema (query-string coercion)', () => {
  it('applies paging defaults', () => {
    expect(JobListQuerySchema.parse({})).toMatchObject({ page: 1, pageSize: 20, sort: 'promisedOn', order: 'asc' });
  });

  it('coerces numbers, lists and booleans from text', () => {
    const q = JobListQuerySchema.parse({ page: '3', pageSize: '50', status: 'on_stand,in_work', mechanicId: '7', overdue: 'false', q: '  ' });
    expect(q).toMatchObject({ page: 3, pageSize: 50, status: ['on_stand', 'in_work'], mechanicId: 7, overdue: false });
    expect(q.q).toBeUndefined();
    expect(JobListQuerySchema.parse({ status: ['ready', 'collected'] }).status).toEqual(['ready', 'collected']);
  });

  it('rejects unknown statuses, page 0 and page sizes over 100', () => {
    expect(JobListQuerySchema.safeParse({ status: 'waiting_parts' }).success).toBe(false);
    expect(JobListQuerySchema.safeParse({ page: '0' }).success).toBe(false);
    expect(JobListQuerySchema.safeParse({ pageSize: '101' }).success).toBe(false);
  });
});

describe('TransitionRequestSchema and FinalCheckRequestSchema', () => {
  it('takes a known status', () => {
    expect(TransitionRequestSchema.parse({ to: 'on_stand' })).toEqual({ to: 'on_stand', note: null });
    expect(TransitionRequestSchema.safeParse({ to: 'done' }).success).toBe(false);
  });

  const items = {
    brakes: true,
    shifting: true,
    steering: true,
    fasteners_torqued: true,
    wheels_true_centred: true,
    tyres_pressure: true,
    axles_closed: true,
    test_ride: true,
  };

  it('passes only when every item passed; a failed check needs a note', () => {
    expect(FinalCheckRequestSchema.safeParse({ items, passed: true }).success).toBe(true);
    expect(FinalCheckRequestSchema.safeParse({ items: { ...items, brakes: false }, passed: true }).success).toBe(false);
    expect(FinalCheckRequestSchema.safeParse({ items: { ...items, brakes: false }, passed: false }).success).toBe(false);
    expect(FinalCheckRequestSchema.safeParse({ items: { ...items, brakes: false }, passed: false, note: 'Rear brake rubs' }).success).toBe(true);
  });
});
