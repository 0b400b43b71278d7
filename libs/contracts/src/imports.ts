import { z } from 'zod';

/** Our fields a CSV column can feed. A row makes (or matches) a customer, and a bike when the bike columns are filled. */
export const IMPORT_FIELDS = [
  'customer.name',
  'customer.email',
  'customer.phone',
  'customer.notes',
  'bike.maker',
  'bike.model',
  'bike.year',
  'bike.frameMaterial',
  'bike.drivetrainSpeeds',
  'bike.brakeType',
  'bike.cableRouting',
  'bike.dropoutType',
  'bike.size',
  'bike.colour',
  'bike.serialNumber',
  'bike.tyreSize',
] as const;
export const ImportFieldSchema = z.enum(IMPORT_FIELDS);
export type ImportField = z.infer<typeof ImportFieldSchema>;

export const IMPORT_FIELD_LABELS: Readonly<Record<ImportField, string>> = {
  'customer.name': 'Owner name',
  'customer.email': 'Owner e-mail',
  'customer.phone': 'Owner phone',
  'customer.notes': 'Owner notes',
  'bike.maker': 'Bike maker',
  'bike.model': 'Bike model',
  'bike.year': 'Model year',
  'bike.frameMaterial': 'Frame material',
  'bike.drivetrainSpeeds': 'Speeds (rear)',
  'bike.brakeType': 'Brake type',
  'bike.cableRouting': 'Cable routing',
  'bike.dropoutType': 'Dropouts',
  'bike.size': 'Frame size',
  'bike.colour': 'Colour',
  'bike.serialNumber': 'Frame serial number',
  'bike.tyreSize': 'Tyre size (ISO)',
};

/** Largest CSV accepted in one go (characters) and rows per file. */
export const IMPORT_MAX_CHARS = 2_000_000;
export const IMPORT_MAX_ROWS = 5000;

/** Column header → our field ('' = not imported). Unknown headers are ignored. */
export const ImportMappingSchema = z.record(z.string().max(200), z.union([ImportFieldSchema, z.literal('')]));
export type ImportMapping = z.infer<typeof ImportMappingSchema>;

export const ImportRequestSchema = z.object({
  csv: z.string().min(1, 'The file is empty').max(IMPORT_MAX_CHARS, 'The file is too large: split it into parts of 5000 rows'),
  /** Leave out for the suggested mapping. */
  mapping: ImportMappingSchema.optional(),
});
export type ImportRequest = z.infer<typeof ImportRequestSchema>;

export const ImportRowSchema = z.object({
  /** Line in the file (the header is line 1). */
  line: z.int(),
  customerName: z.string(),
  bikeLabel: z.string().nullable(),
  /** 'new' customer, or matched to an existing one (same e-mail or phone) in the shop or earlier in the file. */
  customer: z.union([z.object({ kind: z.literal('new') }), z.object({ kind: z.literal('existing'), id: z.int().nullable(), name: z.string() })]),
  problems: z.array(z.object({ field: z.string(), message: z.string() })),
});
export type ImportRow = z.infer<typeof ImportRowSchema>;

export const ImportPreviewSchema = z.object({
  columns: z.array(z.string()),
  mapping: ImportMappingSchema,
  rows: z.array(ImportRowSchema),
  counts: z.object({ rows: z.int(), valid: z.int(), withProblems: z.int(), newCustomers: z.int(), matchedCustomers: z.int(), bikes: z.int() }),
});
export type ImportPreview = z.infer<typeof ImportPreviewSchema>;

export const ImportSummarySchema = z.object({
  customersCreated: z.int(),
  customersMatched: z.int(),
  bikesCreated: z.int(),
  rowsSkipped: z.int(),
  skippedLines: z.array(z.int()),
});
export type ImportSummary = z.infer<typeof ImportSummarySchema>;
