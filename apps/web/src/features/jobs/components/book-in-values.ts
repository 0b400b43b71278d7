import { BookInRequestSchema, CustomerInputSchema, NewBikeInputSchema, type BookInRequest } from '@benchproof/contracts';

/** Customer fields as the form holds them. */
export interface CustomerValues {
  name: string;
  email: string;
  phone: string;
  preferredChannel: 'email' | 'phone' | 'sms';
  notes: string;
}

/** Bike fields as the form holds them: number boxes may be empty while typing. */
export interface BikeValues {
  maker: string;
  model: string;
  year: number | string;
  frameMaterial: 'steel' | 'aluminium' | 'carbon' | 'titanium' | 'other';
  size: string;
  colour: string;
  serialNumber: string;
  drivetrainSpeeds: number | string;
  brakeType: 'rim' | 'mechanical_disc' | 'hydraulic_disc';
  cableRouting: 'external' | 'internal';
  dropoutType: 'vertical' | 'horizontal';
  tyreSize: string;
}

export interface BookInValues {
  customerMode: 'existing' | 'new';
  customerId: number | null;
  customerLabel: string;
  newCustomer: CustomerValues;
  bikeMode: 'existing' | 'new';
  bikeId: number | null;
  newBike: BikeValues;
  reportedSymptoms: string;
  promisedOn: string | null;
  mechanicId: string | null;
}

export const INITIAL_BOOK_IN: BookInValues = {
  customerMode: 'existing',
  customerId: null,
  customerLabel: '',
  newCustomer: { name: '', email: '', phone: '', preferredChannel: 'phone', notes: '' },
  bikeMode: 'existing',
  bikeId: null,
  newBike: {
    maker: '', model: '', year: '', frameMaterial: 'aluminium', size: '', colour: '', serialNumber: '',
    drivetrainSpeeds: 11, brakeType: 'hydraulic_disc', cableRouting: 'external', dropoutType: 'vertical', tyreSize: '',
  },
  reportedSymptoms: '',
  promisedOn: null,
  mechanicId: null,
};

const numOrNaN = (v: number | string) => (v === '' ? Number.NaN : Number(v));

/** The one request the booking-in form sends; a new customer always brings a new bike. */
export function toBookInRequest(v: BookInValues): Record<string, unknown> {
  const existingCustomer = v.customerMode === 'existing';
  const existingBike = existingCustomer && v.bikeMode === 'existing';
  const bike = { ...v.newBike, year: v.newBike.year === '' ? null : Number(v.newBike.year), drivetrainSpeeds: numOrNaN(v.newBike.drivetrainSpeeds) };
  return {
    ...(existingCustomer ? { customerId: v.customerId ?? undefined } : { newCustomer: v.newCustomer }),
    ...(existingBike ? { bikeId: v.bikeId ?? undefined } : { newBike: bike }),
    reportedSymptoms: v.reportedSymptoms,
    promisedOn: v.promisedOn ?? '',
    mechanicId: v.mechanicId ? Number(v.mechanicId) : null,
  };
}

const FRIENDLY: Record<string, string> = {
  customerId: 'Find and pick the customer, or add a new one.',
  bikeId: 'Pick one of their bikes, or add a new one.',
  promisedOn: 'Pick the day the bike is promised for.',
  reportedSymptoms: 'Write down what the owner tells you.',
};

/** Validates with the API's own zod schemas, field by field so each box gets its message. */
export function validateBookIn(values: BookInValues): Record<string, string> {
  const errors: Record<string, string> = {};
  const add = (path: string, message: string) => (errors[path] ??= FRIENDLY[path] ?? message);
  const req = toBookInRequest(values);
  if (values.customerMode === 'existing' && !values.customerId) add('customerId', '');
  if (values.customerMode === 'existing' && values.bikeMode === 'existing' && !values.bikeId) add('bikeId', '');
  if (req.newCustomer) CustomerInputSchema.safeParse(req.newCustomer).error?.issues.forEach((i) => add(`newCustomer.${i.path.join('.')}`, i.message));
  if (req.newBike) NewBikeInputSchema.safeParse(req.newBike).error?.issues.forEach((i) => add(`newBike.${i.path.join('.')}`, i.message));
  BookInRequestSchema.safeParse(req).error?.issues.forEach((i) => add(i.path.join('.'), i.message));
  return errors;
}

export const parseBookIn = (values: BookInValues): BookInRequest => BookInRequestSchema.parse(toBookInRequest(values));
