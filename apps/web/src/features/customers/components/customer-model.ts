import type { CustomerDto, CustomerInput } from '@benchproof/contracts';

/** A customer as a form holds it: every box a string while being typed. */
export interface CustomerFormValues {
  name: string;
  email: string;
  phone: string;
  preferredChannel: CustomerDto['preferredChannel'];
  notes: string;
}

export const EMPTY_CUSTOMER: CustomerFormValues = { name: '', email: '', phone: '', preferredChannel: 'phone', notes: '' };

/** Form values → what CustomerInputSchema parses (the schema trims and turns empty texts into none). */
export const customerFormToInput = (v: CustomerFormValues): Record<keyof CustomerInput, unknown> => ({ ...v });

export const customerToForm = (c: CustomerDto): CustomerFormValues => ({
  name: c.name,
  email: c.email ?? '',
  phone: c.phone ?? '',
  preferredChannel: c.preferredChannel,
  notes: c.notes ?? '',
});

/** The one customer form model: the customer form and booking-in (jobs, through the route) both use it. */
export const CUSTOMER_FORM_MODEL = { empty: EMPTY_CUSTOMER, toInput: customerFormToInput };
