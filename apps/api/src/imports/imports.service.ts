import { Injectable } from '@nestjs/common';
import { IMPORT_MAX_ROWS, type ImportMapping, type ImportPreview, type ImportRow, type ImportSummary } from '@benchproof/contracts';
import { AuditService } from '../audit';
import { BikesService } from '../bikes';
import type { AuthUser } from '../core/auth';
import { UnitOfWork } from '../core/db';
import { DomainError } from '../core/http';
import { CustomersService } from '../customers';
import { csvCell, parseCsv, phoneKey, readRow, suggestMapping, type ReadRow } from './import-rows';

interface PlannedRow extends ReadRow {
  line: number;
  /** An existing customer id, the line of an earlier row of the file making the same customer, or a new one. */
  match: { kind: 'existing'; id: number; name: string } | { kind: 'earlier'; line: number; name: string } | { kind: 'new' };
}

/**
 * CSV import of customers and their bikes. Preview and import run the very same reading and matching,
 * so what the manager saw is what is written: every valid row in one transaction, rows with problems
 * skipped, and a customer with the same e-mail or phone (in the shop or earlier in the file) matched, not doubled.
 */
@Injectable()
export class ImportsService {
  constructor(
    private readonly customers: CustomersService,
    private readonly uow: UnitOfWork,
    private readonly bikes: BikesService,
    private readonly audit: AuditService,
  ) {}

  preview(actor: AuthUser, csv: string, mapping?: ImportMapping): ImportPreview {
    const { columns, map, planned } = this.plan(actor, csv, mapping);
    const rows: ImportRow[] = planned.map((r) => ({
      line: r.line,
      customerName: r.name,
      bikeLabel: r.bike ? `${r.bike.maker} ${r.bike.model}` : null,
      customer: r.match.kind === 'new' ? { kind: 'new' } : { kind: 'existing', id: r.match.kind === 'existing' ? r.match.id : null, name: r.match.name },
      problems: r.problems,
    }));
    const valid = planned.filter((r) => !r.problems.length);
    return {
      columns,
      mapping: map,
      rows,
      counts: {
        rows: planned.length,
        valid: valid.length,
        withProblems: planned.length - valid.length,
        newCustomers: valid.filter((r) => r.match.kind === 'new').length,
        matchedCustomers: valid.filter((r) => r.match.kind !== 'new').length,
        bikes: valid.filter((r) => r.bike).length,
      },
    };
  }

  /** Writes all valid rows in one transaction and says what happened. */
  commit(actor: AuthUser, csv: string, mapping?: ImportMapping): ImportSummary {
    const { planned } = this.plan(actor, csv, mapping);
    const summary: ImportSummary = { customersCreated: 0, customersMatched: 0, bikesCreated: 0, rowsSkipped: 0, skippedLines: [] };
    this.uow.run(() => {
      const madeAt = new Map<number, number>(); // line → customer id made there
      for (const row of planned) {
        if (row.problems.length || !row.customer) {
          summary.rowsSkipped += 1;
          summary.skippedLines.push(row.line);
          continue;
        }
        const customerId = this.customerFor(actor, row, madeAt, summary);
        if (row.bike) {
          this.bikes.insert(actor, customerId, row.bike);
          summary.bikesCreated += 1;
        }
      }
      this.audit.record(actor, { action: 'customers.imported', entityType: 'shop', entityId: actor.shopId, details: { ...summary, skippedLines: undefined } });
    });
    return summary;
  }

  /** The shop's customers as CSV; a cell a spreadsheet would run as a formula is written as text. */
  exportCsv(actor: AuthUser): string {
    const header = ['Name', 'E-mail', 'Phone', 'Notes'].map(csvCell).join(',');
    const lines = this.customers.contacts(actor).map((c) => [c.name, c.email, c.phone, c.notes].map(csvCell).join(','));
    return [header, ...lines].join('\r\n') + '\r\n';
  }

  private customerFor(actor: AuthUser, row: PlannedRow, madeAt: Map<number, number>, summary: ImportSummary): number {
    if (row.match.kind === 'existing') {
      summary.customersMatched += 1;
      return row.match.id;
    }
    const earlier = row.match.kind === 'earlier' ? madeAt.get(row.match.line) : undefined;
    if (earlier !== undefined) {
      summary.customersMatched += 1;
      return earlier;
    }
    const made = this.customers.create(actor, row.customer!, { keepUnreadablePhone: true });
    madeAt.set(row.line, made.id);
    summary.customersCreated += 1;
    return made.id;
  }

  private plan(actor: AuthUser, csv: string, mapping?: ImportMapping) {
    const { columns, rows } = parseCsv(csv);
    if (!columns.length) throw new DomainError('VALIDATION_FAILED', 'The file has no header row.', { issues: [{ path: 'csv', message: 'No header row' }] });
    if (rows.length > IMPORT_MAX_ROWS)
      throw new DomainError('VALIDATION_FAILED', `At most ${IMPORT_MAX_ROWS} rows at a time.`, { issues: [{ path: 'csv', message: 'Too many rows' }] });
    const map = mapping ?? suggestMapping(columns);
    const known = this.contactIndex(actor);
    const inFile = new Map<string, { line: number; name: string }>();
    const planned: PlannedRow[] = rows.map(({ line, cells }) => {
      const read = readRow(columns, cells, map);
      const keys = read.customer ? contactKeys(read.customer) : [];
      const existing = keys.map((k) => known.get(k)).find(Boolean);
      const earlier = keys.map((k) => inFile.get(k)).find(Boolean);
      const match: PlannedRow['match'] = existing ? { kind: 'existing', ...existing } : earlier ? { kind: 'earlier', ...earlier } : { kind: 'new' };
      if (match.kind === 'new' && read.customer && !read.problems.length) for (const k of keys) inFile.set(k, { line, name: read.customer.name });
      return { ...read, line, match };
    });
    return { columns, map, planned };
  }

  private contactIndex(actor: AuthUser): Map<string, { id: number; name: string }> {
    const index = new Map<string, { id: number; name: string }>();
    for (const c of this.customers.contacts(actor)) for (const k of contactKeys(c)) if (!index.has(k)) index.set(k, { id: c.id, name: c.name });
    return index;
  }
}

/** The keys two records of the same person share: the e-mail (case-insensitive) and the phone's last nine digits. */
function contactKeys(c: { email: string | null; phone: string | null }): string[] {
  const phone = phoneKey(c.phone);
  return [c.email ? `e:${c.email.toLowerCase()}` : null, phone ? `p:${phone}` : null].filter((k): k is string => k !== null);
}
