import { z } from 'zod';
import { IdSchema, IsoDateTimeSchema, OptionalEmailSchema, optionalText, pagingQuerySchema, requiredText } from './common';

export const CONTACT_CHANNELS = ['email', 'phone', 'sms'] as const;
export const ContactChannelSchema = z.enum(CONTACT_CHANNELS);
export type ContactChannel = z.infer<typeof ContactChannelSchema>;

/** Digits, spaces, +, -, (, ), at least 6 digits. */
const PhoneSchema = optionalText(40).refine(
  (v) => v === null || (/^[+\d\s()-]+$/.test(v) && v.replace(/\D/g, '').length >= 6),
  'Enter a phone number (digits, spaces, + - ( ))',
);

/** The owner's contact details; the preferred channel must have its contact filled in. */
export const CustomerInputSchema = z
  .object({
    name: requiredText(120),
    email: OptionalEmailSchema,
    phone: PhoneSchema,
    preferredChannel: ContactChannelSchema,
    notes: optionalText(2000),
  })
  .superRefine((c, ctx) => {
    if (c.preferredChannel === 'email' && c.email === null) {
      ctx.addIssue({ code: 'custom', path: ['email'], message: 'Needed to reach the owner by e-mail' });
    }
    if (c.preferredChannel !== 'email' && c.phone === null) {
      ctx.addIssue({ code: 'custom', path: ['phone'], message: 'Needed to reach the owner by phone or text' });
    }
  });
export type CustomerInput = z.infer<typeof CustomerInputSchema>;

export const CustomerDtoSchema = z.object({
  id: IdSchema,
  name: z.string(),
  email: z.email().nullable(),
  phone: z.string().nullable(),
  preferredChannel: ContactChannelSchema,
  notes: z.string().nullable(),
  createdAt: IsoDateTimeSchema,
  /** When the owner replied STOP to a text (no texts go to them until START); null: texts allowed. */
  textsStoppedAt: IsoDateTimeSchema.nullable(),
});
export type CustomerDto = z.infer<typeof CustomerDtoSchema>;

export const CUSTOMER_SORT_FIELDS = ['name', 'createdAt'] as const;
export const CustomerListQuerySchema = pagingQuerySchema(CUSTOMER_SORT_FIELDS);
export type CustomerListQuery = z.infer<typeof CustomerListQuerySchema>;
