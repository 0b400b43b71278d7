import { UpdateShopSettingsRequestSchema, type ShopSettingsDto } from '@benchproof/contracts';
import { DEFAULT_CHAIN_LIMIT_POLICY } from '@benchproof/domain';
import { contractResolver } from '../../../lib/form';

export interface SettingsValues {
  name: string;
  address: string;
  email: string;
  phone: string;
  brandPrimary: string;
  brandAccent: string;
  reportFooter: string;
  labourRate: string;
  taxRatePct: number | string;
  currency: string;
  /** A ShopLocale, or 'auto': the one that fits the currency. */
  locale: string;
  /** ISO 3166-1 alpha-2, chosen from the list. */
  country: string;
  taxNumber: string;
  units: ShopSettingsDto['units'];
  pageSize: ShopSettingsDto['pageSize'];
  finalCheckSecondPerson: boolean;
  showcaseDeskAccess: boolean;
  ownChainLimits: boolean;
  chain: { replaceAt11Pct: number | string; replaceAt10Pct: number | string; cassettePct: number | string };
}

export function fromDto(s: ShopSettingsDto, toMajor: (minor: number, currency: string) => string): SettingsValues {
  return {
    name: s.name,
    address: s.address,
    email: s.email,
    phone: s.phone,
    brandPrimary: s.brandPrimary,
    brandAccent: s.brandAccent,
    reportFooter: s.reportFooter,
    labourRate: toMajor(s.labourRateMinor, s.currency),
    taxRatePct: s.taxRateBp / 100,
    currency: s.currency,
    locale: s.locale ?? 'auto',
    country: s.country,
    taxNumber: s.taxNumber,
    units: s.units,
    pageSize: s.pageSize,
    finalCheckSecondPerson: s.finalCheckSecondPerson,
    showcaseDeskAccess: s.showcaseDeskAccess,
    ownChainLimits: s.chainLimits !== null,
    chain: s.chainLimits ?? { ...DEFAULT_CHAIN_LIMIT_POLICY },
  };
}

/** Request field paths → form field paths, so each message lands under its box (client and server alike). */
const PATHS: Record<string, string> = { labourRateMinor: 'labourRate', taxRateBp: 'taxRatePct' };
export const toFormPath = (p: string) => PATHS[p] ?? p.replace(/^chainLimits\./, 'chain.');

/** Builds the PATCH body: major units → minor, % → basis points. A rate that does not read as money becomes NaN for the schema to refuse. */
export function toRequest(v: SettingsValues, toMinor: (text: string, currency: string) => number | null) {
  const { labourRate, taxRatePct, ownChainLimits, chain, locale, ...rest } = v;
  let labourRateMinor: number | null;
  try {
    labourRateMinor = toMinor(labourRate, v.currency);
  } catch {
    labourRateMinor = null;
  }
  return {
    ...rest,
    locale: locale === 'auto' ? null : locale,
    labourRateMinor: labourRateMinor ?? Number.NaN,
    taxRateBp: taxRatePct === '' ? Number.NaN : Math.round(Number(taxRatePct) * 100),
    chainLimits: ownChainLimits
      ? { replaceAt11Pct: Number(chain.replaceAt11Pct), replaceAt10Pct: Number(chain.replaceAt10Pct), cassettePct: Number(chain.cassettePct) }
      : null,
  };
}

/** The contract's schema through the form resolver; an unreadable rate gets a worked example instead of "NaN". */
export function validateSettings(toMinor: (text: string, currency: string) => number | null) {
  const resolve = contractResolver(UpdateShopSettingsRequestSchema, (v: SettingsValues) => toRequest(v, toMinor), toFormPath);
  return (v: SettingsValues): Record<string, string> => {
    const errors = resolve(v);
    if (errors.labourRate && Number.isNaN(toRequest(v, toMinor).labourRateMinor)) errors.labourRate = 'Enter the hourly rate, e.g. 52.50';
    return errors;
  };
}
