import { BookInRequestSchema, type BookInRequest } from '@benchproof/contracts';
import { contractResolver } from '../../../lib/form';

/**
 * A part of the form another feature owns (its values, their empty state and how
 * they become the contract's input). The route hands the customers' and the bikes'
 * models in, so jobs never imports those features.
 */
export interface FormModel {
  empty: unknown;
  // Method syntax on purpose: each feature's toInput takes its own value type.
  toInput(values: never): unknown;
}
export type BikeFormModel = FormModel;
export type CustomerFormModel = FormModel;

export interface BookInModels {
  customer: CustomerFormModel;
  bike: BikeFormModel;
}

export interface BookInValues {
  customerMode: 'existing' | 'new';
  customerId: number | null;
  customerLabel: string;
  /** Held as the customers feature's form values; only its model reads them. */
  newCustomer: unknown;
  bikeMode: 'existing' | 'new';
  bikeId: number | null;
  /** Held as the bikes feature's form values; only its model reads them. */
  newBike: unknown;
  reportedSymptoms: string;
  promisedOn: string | null;
  mechanicId: string | null;
}

export const initialBookIn = (models: BookInModels): BookInValues => ({
  customerMode: 'existing',
  customerId: null,
  customerLabel: '',
  newCustomer: models.customer.empty,
  bikeMode: 'existing',
  bikeId: null,
  newBike: models.bike.empty,
  reportedSymptoms: '',
  promisedOn: null,
  mechanicId: null,
});

const inputOf = (model: FormModel, values: unknown) => (model.toInput as (v: unknown) => unknown)(values);

/** The one request the booking-in form sends; a new customer always brings a new bike. */
export function toBookInRequest(v: BookInValues, models: BookInModels): Record<string, unknown> {
  const existingCustomer = v.customerMode === 'existing';
  const existingBike = existingCustomer && v.bikeMode === 'existing';
  return {
    ...(existingCustomer ? { customerId: v.customerId ?? undefined } : { newCustomer: inputOf(models.customer, v.newCustomer) }),
    ...(existingBike ? { bikeId: v.bikeId ?? undefined } : { newBike: inputOf(models.bike, v.newBike) }),
    reportedSymptoms: v.reportedSymptoms,
    promisedOn: v.promisedOn ?? '',
    mechanicId: v.mechanicId ? Number(v.mechanicId) : null,
  };
}

/** Plainer words for the boxes where the schema's message would puzzle the desk. */
const FRIENDLY: Record<string, string> = {
  customerId: 'Find and pick the customer, or add a new one.',
  bikeId: 'Pick one of their bikes, or add a new one.',
  promisedOn: 'Pick the day the bike is promised for.',
  reportedSymptoms: 'Write down what the owner tells you.',
};

/** Validates with the API's own BookInRequestSchema (nested customer and bike schemas included). */
export const validateBookIn = (models: BookInModels) => {
  const resolve = contractResolver(BookInRequestSchema, (v: BookInValues) => toBookInRequest(v, models));
  return (values: BookInValues): Record<string, string> => {
    const errors = resolve(values);
    // The schema only checks "one of id or new" once the rest parses; pick-first hints show at once.
    if (values.customerMode === 'existing' && !values.customerId) errors.customerId = '';
    if (values.customerMode === 'existing' && values.bikeMode === 'existing' && !values.bikeId) errors.bikeId = '';
    return Object.fromEntries(Object.entries(errors).map(([path, message]) => [path, FRIENDLY[path] ?? message]));
  };
};

export const parseBookIn = (values: BookInValues, models: BookInModels): BookInRequest => BookInRequestSchema.parse(toBookInRequest(values, models));
