import { BookInRequestSchema, CustomerInputSchema, NewBikeInputSchema, type BookInRequest, type ContactChannel } from '@benchproof/contracts';

/** Customer fields as the form holds them. */
export interface CustomerValues {
  name: string;
  email: string;
  phone: string;
  preferredChannel: ContactChannel;
  notes: string;
}

/**
 * The bike part of the form. The bikes feature owns the model (its values, their
 * empty state and how they become the contract's bike input); the route hands it in.
 */
export interface BikeFormModel {
  empty: unknown;
  // Method syntax on purpose: the bikes feature's toInput takes its own value type.
  toInput(values: never): unknown;
}

export interface BookInValues {
  customerMode: 'existing' | 'new';
  customerId: number | null;
  customerLabel: string;
  newCustomer: CustomerValues;
  bikeMode: 'existing' | 'new';
  bikeId: number | null;
  /** Held as the bikes feature's form values; only BikeFormModel reads them. */
  newBike: unknown;
  reportedSymptoms: string;
  promisedOn: string | null;
  mechanicId: string | null;
}

export const initialBookIn = (bike: BikeFormModel): BookInValues => ({
  customerMode: 'existing',
  customerId: null,
  customerLabel: '',
  newCustomer: { name: '', email: '', phone: '', preferredChannel: 'phone', notes: '' },
  bikeMode: 'existing',
  bikeId: null,
  newBike: bike.empty,
  reportedSymptoms: '',
  promisedOn: null,
  mechanicId: null,
});

/** The one request the booking-in form sends; a new customer always brings a new bike. */
export function toBookInRequest(v: BookInValues, bikeModel: BikeFormModel): Record<string, unknown> {
  const existingCustomer = v.customerMode === 'existing';
  const existingBike = existingCustomer && v.bikeMode === 'existing';
  const bike = (bikeModel.toInput as (values: unknown) => unknown)(v.newBike);
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
export const validateBookIn = (bikeModel: BikeFormModel) => (values: BookInValues): Record<string, string> => {
  const errors: Record<string, string> = {};
  const add = (path: string, message: string) => (errors[path] ??= FRIENDLY[path] ?? message);
  const req = toBookInRequest(values, bikeModel);
  if (values.customerMode === 'existing' && !values.customerId) add('customerId', '');
  if (values.customerMode === 'existing' && values.bikeMode === 'existing' && !values.bikeId) add('bikeId', '');
  if (req.newCustomer) CustomerInputSchema.safeParse(req.newCustomer).error?.issues.forEach((i) => add(`newCustomer.${i.path.join('.')}`, i.message));
  if (req.newBike) NewBikeInputSchema.safeParse(req.newBike).error?.issues.forEach((i) => add(`newBike.${i.path.join('.')}`, i.message));
  BookInRequestSchema.safeParse(req).error?.issues.forEach((i) => add(i.path.join('.'), i.message));
  return errors;
};

export const parseBookIn = (values: BookInValues, bikeModel: BikeFormModel): BookInRequest => BookInRequestSchema.parse(toBookInRequest(values, bikeModel));
