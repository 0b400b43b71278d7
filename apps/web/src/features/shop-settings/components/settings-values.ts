import { UpdateShopSettingsRequestSchema, type ShopSettingsDto } from '@benchproof/contracts';
import { DEFAULT_CHAIN_LIMIT_POLICY } from '@benchproof/domain';

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
  units: ShopSettingsDto['units'];
  pageSize: ShopSettingsDto['pageSize'];
  finalCheckSecondPerson: boolean;
  ownChainLimits: boolean;
  chain: { replaceAt11Pct: number | string; replaceAt10Pct: number | string; cassettePct: number | string };
}

export function fromDto(s: ShopSettingsDto, toMajor: (minor: number, currency: string) => string): SettingsValues {
  return {
    name: s.name, address: s.address, email: s.email, phone: s.phone, brandPrimary: s.brandPrimary, brandAccent: s.brandAccent, reportFooter: s.reportFooter,
    labourRate: toMajor(s.labourRateMinor, s.currency),
    taxRatePct: s.taxRateBp / 100,
    currency: s.currency, units: s.units, pageSize: s.pageSize, finalCheckSecondPerson: s.finalCheckSecondPerson,
    ownChainLimits: s.chainLimits !== null,
    chain: s.chainLimits ?? { ...DEFAULT_CHAIN_LIMIT_POLICY },
  };
}

/** Request field paths → form field paths, so each message lands under its box. */
const PATHS: Record<string, string> = { labourRateMinor: 'labourRate', taxRateBp: 'taxRatePct' };
const toFormPath = (p: string) => PATHS[p] ?? p.replace(/^chainLimits\./, 'chain.');

/** Builds the PATCH body (major units → minor, % → basis points) and checks it with the API's schema. */
export function toRequest(v: SettingsValues, toMinor: (text: string, currency: string) => number | null) {
  const { labourRate, taxRatePct, ownChainLimits, chain, ...rest } = v;
  let labourRateMinor: number | null;
  try {
    labourRateMinor = toMinor(labourRate, v.currency);
  } catch {
    labourRateMinor = null;
  }
  const request = {
    ...rest,
    labourRateMinor: labourRateMinor ?? Number.NaN,
    taxRateBp: taxRatePct === '' ? Number.NaN : Math.round(Number(taxRatePct) * 100),
    chainLimits: ownChainLimits ? { replaceAt11Pct: Number(chain.replaceAt11Pct), replaceAt10Pct: Number(chain.replaceAt10Pct), cassettePct: Number(chain.cassettePct) } : null,
  };
  const r = UpdateShopSettingsRequestSchema.safeParse(request);
  const errors: Record<string, string> = r.success ? {} : Object.fromEntries(r.error.issues.map((i) => [toFormPath(i.path.join('.')), i.message]));
  if (labourRateMinor === null) errors.labourRate = 'Enter the hourly rate, e.g. 52.50';
  return { request, errors };
}
