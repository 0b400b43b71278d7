import {
  CustomerInputSchema,
  IMPORT_FIELDS,
  NewBikeInputSchema,
  type CustomerInput,
  type ImportField,
  type ImportMapping,
  type NewBikeInput,
} from '@benchproof/contracts';
import Papa from 'papaparse';

/** Header words (lower case, letters and digits only) we recognise for each field; anything else is left for the manager to map. */
const HEADER_WORDS: Record<ImportField, string[]> = {
  'customer.name': ['name', 'customer', 'customername', 'owner', 'ownername', 'fullname', 'client', 'clientname'],
  'customer.email': ['email', 'emailaddress', 'mail', 'customeremail', 'owneremail'],
  'customer.phone': ['phone', 'telephone', 'tel', 'mobile', 'cell', 'phonenumber', 'mobilenumber'],
  'customer.notes': ['notes', 'note', 'comments', 'remarks'],
  'bike.maker': ['maker', 'make', 'brand', 'manufacturer', 'bikemake', 'bikebrand'],
  'bike.model': ['model', 'bikemodel'],
  'bike.year': ['year', 'modelyear'],
  'bike.frameMaterial': ['frame', 'material', 'framematerial'],
  'bike.drivetrainSpeeds': ['speeds', 'gears', 'speed', 'drivetrainspeeds'],
  'bike.brakeType': ['brakes', 'brake', 'braketype'],
  'bike.cableRouting': ['routing', 'cablerouting', 'cables'],
  'bike.dropoutType': ['dropouts', 'dropout', 'dropouttype'],
  'bike.size': ['size', 'framesize'],
  'bike.colour': ['colour', 'color'],
  'bike.serialNumber': ['serial', 'serialnumber', 'frameserial', 'framenumber', 'serialno'],
  'bike.tyreSize': ['tyre', 'tire', 'tyresize', 'tiresize', 'etrto'],
};

/** Words people write for our value lists (common practice, no source). */
const FRAME_WORDS: Record<string, NewBikeInput['frameMaterial']> = {
  steel: 'steel',
  crmo: 'steel',
  cromo: 'steel',
  chromoly: 'steel',
  chromemoly: 'steel',
  aluminium: 'aluminium',
  aluminum: 'aluminium',
  alu: 'aluminium',
  alloy: 'aluminium',
  carbon: 'carbon',
  carbonfibre: 'carbon',
  carbonfiber: 'carbon',
  cf: 'carbon',
  titanium: 'titanium',
  ti: 'titanium',
  other: 'other',
  bamboo: 'other',
  wood: 'other',
};
const BRAKE_WORDS: Record<string, NewBikeInput['brakeType']> = {
  rim: 'rim',
  rimbrake: 'rim',
  rimbrakes: 'rim',
  vbrake: 'rim',
  caliper: 'rim',
  cantilever: 'rim',
  disc: 'mechanical_disc',
  mechanical: 'mechanical_disc',
  mechanicaldisc: 'mechanical_disc',
  cabledisc: 'mechanical_disc',
  hydraulic: 'hydraulic_disc',
  hydraulicdisc: 'hydraulic_disc',
  hydro: 'hydraulic_disc',
};
const ROUTING_WORDS: Record<string, NewBikeInput['cableRouting']> = { external: 'external', internal: 'internal', ext: 'external', int: 'internal' };
const DROPOUT_WORDS: Record<string, NewBikeInput['dropoutType']> = {
  vertical: 'vertical',
  horizontal: 'horizontal',
  track: 'horizontal',
  sliding: 'horizontal',
};

const squash = (s: string): string => s.toLowerCase().replace(/[^\p{L}\p{N}]+/gu, '');

export interface ParsedCsv {
  columns: string[];
  /** Data rows with their line number in the file (header = line 1). */
  rows: Array<{ line: number; cells: string[] }>;
}

/** Parses CSV text with papaparse (delimiter detected: comma, semicolon or tab). Every cell stays a string. */
export function parseCsv(text: string): ParsedCsv {
  const clean = text.replace(/^\uFEFF/, '');
  const result = Papa.parse<string[]>(clean, { delimiter: delimiterOf(clean), skipEmptyLines: false, dynamicTyping: false });
  const [header = [], ...data] = result.data;
  const columns = header.map((h) => h.trim());
  // Blank lines are dropped after numbering, so a problem's line is the one the spreadsheet shows.
  const rows = data.map((cells, i) => ({ line: i + 2, cells })).filter((r) => r.cells.some((c) => c.trim() !== ''));
  return { columns, rows };
}

/** The header line's most frequent of comma, semicolon and tab (spreadsheets in comma-decimal locales save with semicolons). */
function delimiterOf(text: string): string {
  const header = text.split(/\r?\n/, 1)[0] ?? '';
  const counts = [',', ';', '\t'].map((d) => [d, header.split(d).length - 1] as const);
  return counts.reduce((best, c) => (c[1] > best[1] ? c : best))[0];
}

/** Our best guess of each column's field; each field is used once (the first column that fits). */
export function suggestMapping(columns: string[]): ImportMapping {
  const used = new Set<ImportField>();
  const mapping: ImportMapping = {};
  for (const column of columns) {
    const field = IMPORT_FIELDS.find((f) => !used.has(f) && HEADER_WORDS[f].includes(squash(column)));
    mapping[column] = field ?? '';
    if (field) used.add(field);
  }
  return mapping;
}

export interface ReadRow {
  /** The owner's name as written (shown even when the row has problems). */
  name: string;
  customer: CustomerInput | null;
  bike: NewBikeInput | null;
  problems: Array<{ field: string; message: string }>;
}

/** The cell values of one row by field; cells are kept exactly as written (a leading "=" is just text). */
function valuesOf(columns: string[], cells: string[], mapping: ImportMapping): Partial<Record<ImportField, string>> {
  const values: Partial<Record<ImportField, string>> = {};
  columns.forEach((column, i) => {
    const field = mapping[column];
    const cell = (cells[i] ?? '').trim();
    if (field && cell && values[field] === undefined) values[field] = cell;
  });
  return values;
}

/** Checks one row against the same contract schemas the forms use, and names every problem. */
export function readRow(columns: string[], cells: string[], mapping: ImportMapping): ReadRow {
  const v = valuesOf(columns, cells, mapping);
  const problems: ReadRow['problems'] = [];
  const customer = CustomerInputSchema.safeParse({
    name: v['customer.name'] ?? '',
    email: v['customer.email'] ?? null,
    phone: v['customer.phone'] ?? null,
    notes: v['customer.notes'] ?? null,
    preferredChannel: v['customer.email'] ? 'email' : 'phone',
  });
  if (!customer.success)
    for (const i of customer.error.issues) problems.push({ field: `customer.${String(i.path[0] ?? '')}`, message: customerMessage(i.path[0], i.message) });
  const bike = readBike(v, problems);
  return { name: v['customer.name'] ?? '', customer: customer.success ? customer.data : null, bike, problems };
}

const customerMessage = (field: unknown, message: string): string =>
  field === 'phone' && message.startsWith('Needed') ? 'Give an e-mail address or a phone number' : field === 'name' ? 'The owner’s name is missing' : message;

const BIKE_KEYS = IMPORT_FIELDS.filter((f) => f.startsWith('bike.'));

function readBike(v: Partial<Record<ImportField, string>>, problems: ReadRow['problems']): NewBikeInput | null {
  if (!BIKE_KEYS.some((k) => v[k])) return null;
  const pick = <T>(field: ImportField, words: Record<string, T>, fallback?: T): T | undefined => {
    const raw = v[field];
    if (!raw) return fallback;
    const hit = words[squash(raw)];
    // The field's name is already before the message on the preview: name the values we read instead of the code key.
    const known = [...new Set(Object.values(words).map((w) => String(w).replace(/_/g, ' ')))].join(', ');
    if (hit === undefined) problems.push({ field, message: `“${raw}” is not one we know (we read: ${known})` });
    return hit;
  };
  const spec = {
    maker: v['bike.maker'] ?? '',
    model: v['bike.model'] ?? '',
    year: v['bike.year'] ? Number(v['bike.year']) : null,
    frameMaterial: pick('bike.frameMaterial', FRAME_WORDS),
    drivetrainSpeeds: v['bike.drivetrainSpeeds'] ? Number(v['bike.drivetrainSpeeds']) : undefined,
    brakeType: pick('bike.brakeType', BRAKE_WORDS),
    // Not in most spreadsheets; the usual build (common practice, no source), corrected at book-in.
    cableRouting: pick('bike.cableRouting', ROUTING_WORDS, 'external' as const),
    dropoutType: pick('bike.dropoutType', DROPOUT_WORDS, 'vertical' as const),
    size: v['bike.size'] ?? null,
    colour: v['bike.colour'] ?? null,
    serialNumber: v['bike.serialNumber'] ?? null,
    tyreSize: v['bike.tyreSize'] ?? null,
  };
  const parsed = NewBikeInputSchema.safeParse(spec);
  if (parsed.success) return parsed.data;
  const known = new Set(problems.map((p) => p.field));
  for (const i of parsed.error.issues) {
    const field = `bike.${String(i.path[0] ?? '')}`;
    if (!known.has(field))
      problems.push({
        field,
        message: spec[i.path[0] as keyof typeof spec] === undefined || spec[i.path[0] as keyof typeof spec] === '' ? 'Missing' : i.message,
      });
  }
  return null;
}

/** Digits only, for matching the same phone written differently. */
export const phoneKey = (phone: string | null): string | null => {
  const digits = phone?.replace(/\D/g, '') ?? '';
  return digits.length >= 6 ? digits.slice(-9) : null;
};

/**
 * A cell as it may safely go into a CSV for a spreadsheet: text that a spreadsheet would run as a formula
 * (starting with = + - @, tab or carriage return) gets a leading apostrophe, as OWASP's "CSV Injection"
 * guidance describes; everything is quoted.
 */
export const csvCell = (value: string | number | null): string => {
  const text = value === null ? '' : String(value);
  const safe = /^[=+\-@\t\r]/.test(text) ? `'${text}` : text;
  return `"${safe.replace(/"/g, '""')}"`;
};
