import { Inject, Injectable } from '@nestjs/common';
import { CONSENT_WORDING, type EraseCustomerResult } from '@benchproof/contracts';
import type Database from 'better-sqlite3';
import { AuditService } from '../audit';
import { ConsentService } from '../consent';
import type { AuthUser } from '../core/auth';
import { CLOCK, type Clock } from '../core/clock';
import { SQLITE } from '../core/db';
import { DomainError, notFound } from '../core/http';
import { STORAGE, type Storage } from '../infra/storage';
import { exportQueries } from './export-scope';

const ERASED = '[erased]';
/** Jobs handed over stay in the shop's records (work done, safety work declined, warranty); their bike photos stay with them. */
const KEPT_JOB_STATUSES = new Set(['collected']);

interface Person {
  name: string;
  email: string;
  phone: string;
  notes: string;
}

/**
 * Erasure on request. Consent is withdrawn on each of the customer's jobs first (the showcase drops
 * them and refuses exports), then in one transaction: the customer's contact details go, every text
 * column of every row tied to the customer has their name, e-mail, phone and notes replaced, mail
 * bodies and owner links are cleared, photos of jobs never handed over are purged, report PDFs
 * (they print the name) are removed while their fingerprints stay verifiable. Files go after commit.
 */
@Injectable()
export class CustomerErasureService {
  constructor(
    @Inject(SQLITE) private readonly opened: { sqlite: Database.Database },
    @Inject(STORAGE) private readonly storage: Storage,
    @Inject(CLOCK) private readonly clock: Clock,
    private readonly consent: ConsentService,
    private readonly audit: AuditService,
  ) {}

  async erase(actor: AuthUser, customerId: number, confirmCustomerId: number): Promise<EraseCustomerResult> {
    const db = this.opened.sqlite;
    const person = db.prepare('SELECT name, email, phone, notes FROM customers WHERE id = ? AND shop_id = ?').get(customerId, actor.shopId) as
      Person | undefined;
    if (!person) throw notFound('Customer');
    if (confirmCustomerId !== customerId) throw new DomainError('VALIDATION_FAILED', 'Confirm with the number of the customer to erase.');
    const jobs = db.prepare('SELECT id, status FROM jobs WHERE shop_id = ? AND customer_id = ?').all(actor.shopId, customerId) as {
      id: number;
      status: string;
    }[];
    for (const j of jobs)
      this.consent.recordInPerson(actor, j.id, {
        granted: false,
        nameMakeModel: false,
        wordingVersion: CONSENT_WORDING.version,
        givenByName: 'Erasure on request',
      });
    const strings = this.personalStrings(db, actor.shopId, customerId, person);
    const { files, result } = db.transaction(() => this.eraseRows(db, actor, customerId, jobs, strings))();
    for (const key of files) await this.storage.delete(key);
    for (const fts of ['customer_search', 'job_search', 'bike_search'])
      if (db.prepare(`SELECT 1 FROM sqlite_master WHERE name = ?`).get(fts)) db.prepare(`INSERT INTO ${fts}(${fts}) VALUES ('optimize')`).run();
    return result;
  }

  /** What identifies the person: contact details, names consent was given under, addresses mail and links went to. */
  private personalStrings(db: Database.Database, shopId: number, customerId: number, p: Person): string[] {
    const jobsOf = 'SELECT id FROM jobs WHERE shop_id = ? AND customer_id = ?';
    const extra = db
      .prepare(
        `SELECT given_by_name FROM consents WHERE job_id IN (${jobsOf}) UNION SELECT sent_to FROM owner_links WHERE job_id IN (${jobsOf})
         UNION SELECT to_address FROM outbox_messages WHERE job_id IN (${jobsOf})`,
      )
      .pluck()
      .all(shopId, customerId, shopId, customerId, shopId, customerId) as string[];
    const all = [p.name, p.email, p.phone, p.notes, ...extra].map((s) => s.trim()).filter((s) => s.length >= 3 && s !== 'Erasure on request');
    return [...new Set([...all, ...all.map((s) => s.toLowerCase())])].sort((a, b) => b.length - a.length);
  }

  private eraseRows(db: Database.Database, actor: AuthUser, customerId: number, jobs: { id: number; status: string }[], strings: string[]) {
    const scope = { kind: 'customer' as const, shopId: actor.shopId, customerId };
    for (const q of exportQueries(db, scope, { allColumns: true })) {
      const textCols = (db.prepare(`SELECT name FROM pragma_table_info(?) WHERE lower(type) = 'text'`).pluck().all(q.table) as string[]).filter((c) =>
        q.columns.includes(c),
      );
      for (const col of textCols)
        for (const s of strings)
          db.prepare(`UPDATE "${q.table}" SET "${col}" = replace("${col}", ?, '${ERASED}') WHERE instr("${col}", ?) > 0 AND (${q.where})`).run(
            s,
            s,
            ...q.params,
          );
    }
    const now = this.clock.now().getTime();
    db.prepare(`UPDATE customers SET name = ?, email = '', phone = '', notes = '' WHERE id = ?`).run(`Erased customer ${customerId}`, customerId);
    db.prepare(`UPDATE bikes SET serial_number = '', notes = '' WHERE shop_id = ? AND customer_id = ?`).run(actor.shopId, customerId);
    const ids = jobs.map((j) => j.id);
    const inJobs = `job_id IN (${ids.map(() => '?').join(',') || 'NULL'})`;
    db.prepare(
      `UPDATE outbox_messages SET to_address = '', text_body = ?, html_body = ?, text_after_send = NULL, html_after_send = NULL, sealed_secrets = NULL WHERE ${inJobs}`,
    ).run(ERASED, ERASED, ...ids);
    db.prepare(`UPDATE text_messages SET to_number = '', body = ?, body_after_send = NULL, sealed_secrets = NULL WHERE shop_id = ? AND customer_id = ?`).run(
      ERASED,
      actor.shopId,
      customerId,
    );
    db.prepare(`UPDATE owner_links SET sent_to = '', revoked_at = coalesce(revoked_at, ?) WHERE ${inJobs}`).run(now, ...ids);
    const { files, mediaDeleted, mediaKept } = this.purgeMedia(db, jobs, inJobs, ids, now);
    const reports = db
      .prepare(`SELECT storage_key FROM reports WHERE ${inJobs} AND storage_key IS NOT NULL`)
      .pluck()
      .all(...ids) as string[];
    db.prepare(`UPDATE reports SET storage_key = NULL WHERE ${inJobs}`).run(...ids);
    files.push(...reports);
    const result: EraseCustomerResult = {
      customerId,
      jobs: jobs.length,
      mediaDeleted,
      mediaKept,
      reportFilesDeleted: reports.length,
    };
    this.audit.record(actor, { action: 'customer.erased', entityType: 'customer', entityId: customerId, details: { ...result } });
    return { files, result };
  }

  /** Photos and videos of jobs never handed over are purged (files and derivatives); those of handed-over jobs stay. */
  private purgeMedia(db: Database.Database, jobs: { id: number; status: string }[], inJobs: string, ids: number[], now: number) {
    const files: string[] = [];
    const gone = jobs.filter((j) => !KEPT_JOB_STATUSES.has(j.status)).map((j) => j.id);
    const assets = db.prepare(`SELECT id, job_id, original_key FROM media_assets WHERE ${inJobs} AND purged_at IS NULL`).all(...ids) as {
      id: number;
      job_id: number;
      original_key: string | null;
    }[];
    let mediaDeleted = 0;
    for (const a of assets) {
      db.prepare(`UPDATE media_assets SET original_name = '' WHERE id = ?`).run(a.id);
      if (!gone.includes(a.job_id)) continue;
      files.push(...(db.prepare('SELECT key FROM media_derivatives WHERE asset_id = ?').pluck().all(a.id) as string[]));
      if (a.original_key) files.push(a.original_key);
      db.prepare('DELETE FROM media_derivatives WHERE asset_id = ?').run(a.id);
      db.prepare(`UPDATE media_assets SET original_key = NULL, caption = '', purged_at = ?, deleted_at = coalesce(deleted_at, ?) WHERE id = ?`).run(
        now,
        now,
        a.id,
      );
      mediaDeleted++;
    }
    return { files, mediaDeleted, mediaKept: assets.length - mediaDeleted };
  }
}
