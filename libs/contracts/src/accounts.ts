import { SHOP_LOCALES } from '@benchproof/domain';
import { z } from 'zod';
import { RoleSchema, SessionUserSchema } from './auth';
import { EmailSchema, IdSchema, IsoDateTimeSchema, requiredText } from './common';
import { CurrencySchema, UnitSystemSchema } from './shops';
import { MIN_PASSWORD_LENGTH } from './users';

/** A password someone chooses for their own account; the api also refuses common and guessable ones (WEAK_PASSWORD). */
export const NewPasswordSchema = z.string().min(MIN_PASSWORD_LENGTH, `At least ${MIN_PASSWORD_LENGTH} characters`).max(200);

/** The single-use secret from an e-mailed link. */
export const LinkTokenSchema = z.string().min(20).max(200);

// ---- first-run setup and self-service sign-up ----

export const SetupStatusSchema = z.object({
  /** True while the database has no shop: the web shows the setup screen. */
  setupOpen: z.boolean(),
  /** True when this server lets new workshops sign themselves up (SIGNUP=open). */
  signupOpen: z.boolean(),
});
export type SetupStatus = z.infer<typeof SetupStatusSchema>;

export const NewShopSchema = z.object({
  name: requiredText(120),
  address: z.string().trim().max(500).default(''),
  phone: z.string().trim().max(40).default(''),
  email: z.union([z.literal(''), EmailSchema]).default(''),
  currency: CurrencySchema,
  units: UnitSystemSchema,
  /** How dates are written; null (the default) follows the currency, as in the shop settings. */
  locale: z.enum(SHOP_LOCALES).nullable().default(null),
  /** Tax rate in basis points: 2000 = 20 %. */
  taxRateBp: z.int().min(0).max(10_000),
  /** Labour rate per hour in minor units. */
  labourRateMinor: z.int().min(0).max(1_000_000),
});
export type NewShop = z.infer<typeof NewShopSchema>;

export const FirstManagerSchema = z.object({ name: requiredText(100), email: EmailSchema, password: NewPasswordSchema });

export const SetupRequestSchema = z.object({
  /** The one-time code the server printed when it started. */
  code: z.string().trim().min(1, 'Required').max(64),
  shop: NewShopSchema,
  manager: FirstManagerSchema,
});
export type SetupRequest = z.infer<typeof SetupRequestSchema>;

export const SignupRequestSchema = z.object({ shop: NewShopSchema, manager: FirstManagerSchema });
export type SignupRequest = z.infer<typeof SignupRequestSchema>;

export const TokenRequestSchema = z.object({ token: LinkTokenSchema });
export type TokenRequest = z.infer<typeof TokenRequestSchema>;

// ---- invitations ----

export const InviteRequestSchema = z.object({ name: requiredText(100), email: EmailSchema, role: RoleSchema });
export type InviteRequest = z.infer<typeof InviteRequestSchema>;

export const InvitationDtoSchema = z.object({
  id: IdSchema,
  name: z.string(),
  email: z.string(),
  role: RoleSchema,
  sentAt: IsoDateTimeSchema,
  expiresAt: IsoDateTimeSchema,
  expired: z.boolean(),
});
export type InvitationDto = z.infer<typeof InvitationDtoSchema>;

/** What the person opening an invitation link sees before choosing a password. */
export const InvitationPreviewSchema = z.object({ shopName: z.string(), name: z.string(), email: z.string(), role: RoleSchema });
export type InvitationPreview = z.infer<typeof InvitationPreviewSchema>;

export const AcceptInvitationRequestSchema = z.object({ token: LinkTokenSchema, password: NewPasswordSchema });
export type AcceptInvitationRequest = z.infer<typeof AcceptInvitationRequestSchema>;

// ---- forgotten passwords ----

export const ForgotPasswordRequestSchema = z.object({ email: EmailSchema });
export type ForgotPasswordRequest = z.infer<typeof ForgotPasswordRequestSchema>;

export const ResetPasswordRequestSchema = z.object({ token: LinkTokenSchema, password: NewPasswordSchema });
export type ResetPasswordRequest = z.infer<typeof ResetPasswordRequestSchema>;

// ---- sign-in steps and two-factor ----

/** After the password: either a session, or the next step with a short-lived challenge (no session yet). */
export const SignInStepSchema = z.union([
  z.object({ step: z.literal('done'), user: SessionUserSchema, expiresAt: z.string(), csrfToken: z.string() }),
  z.object({ step: z.enum(['code', 'enrol']), challenge: z.string() }),
]);
export type SignInStep = z.infer<typeof SignInStepSchema>;

/** A six-digit code from the authenticator app, or one of the recovery codes. */
export const SecondFactorCodeSchema = z
  .string()
  .trim()
  .min(6, 'Enter the 6-digit code')
  .max(20)
  .transform((v) => v.replace(/[\s-]/g, '').toLowerCase());

export const CodeStepRequestSchema = z.object({ challenge: z.string().min(10).max(2000), code: SecondFactorCodeSchema });
export type CodeStepRequest = z.infer<typeof CodeStepRequestSchema>;

export const ChallengeRequestSchema = z.object({ challenge: z.string().min(10).max(2000) });
export type ChallengeRequest = z.infer<typeof ChallengeRequestSchema>;

export const TotpEnrolmentSchema = z.object({ secret: z.string(), otpauthUrl: z.string(), qrSvg: z.string() });
export type TotpEnrolment = z.infer<typeof TotpEnrolmentSchema>;

export const ConfirmTotpRequestSchema = z.object({ code: SecondFactorCodeSchema });
export type ConfirmTotpRequest = z.infer<typeof ConfirmTotpRequestSchema>;

export const RecoveryCodesSchema = z.object({ recoveryCodes: z.array(z.string()) });
export type RecoveryCodes = z.infer<typeof RecoveryCodesSchema>;

export const TwoFactorStatusSchema = z.object({ enabled: z.boolean(), requiredByShop: z.boolean(), recoveryCodesLeft: z.number().int() });
export type TwoFactorStatus = z.infer<typeof TwoFactorStatusSchema>;

export const RequireTwoFactorRequestSchema = z.object({ required: z.boolean() });
export type RequireTwoFactorRequest = z.infer<typeof RequireTwoFactorRequestSchema>;
