import { Inject, Injectable } from '@nestjs/common';
import type { TextMessageDto } from '@benchproof/contracts';
import { APP_CONFIG, type AppConfig } from '../config';
import { CLOCK, type Clock } from '../core/clock';
import { sealSecrets, withPlaceholders } from '../core/crypto';
import { type DbTx, UnitOfWork } from '../core/db';
import { CustomersService } from '../customers';
import { TASK_RUNNER, type TaskRunner } from '../infra/tasks';
import { JobAccess } from '../jobs';
import { ShopsService } from '../shops';
import { LINK_REMOVED, textBody, type TextKind } from './text-bodies';
import { type NewTextRow, type TextRow, TextsRepository } from './texts.repository';

export const TEXT_SEND = 'text.send' as const;

/** What a caller asks for: a text about a job to its owner; `link` (an owner link) is stored only sealed and dropped once sent. */
export interface TextRequest {
  jobId: number;
  customerId: number;
  kind: TextKind;
  link: string | null;
}

export type TextQueued = { status: 'queued'; id: number; to: string } | { status: 'not_sent'; reason: string };

type Scope = { shopId: number };

/** The text outbox: a row written with its cause and a 'text.send' task, like e-mail. */
@Injectable()
export class TextsService {
  constructor(
    private readonly repo: TextsRepository,
    private readonly uow: UnitOfWork,
    private readonly access: JobAccess,
    private readonly customers: CustomersService,
    private readonly shops: ShopsService,
    @Inject(TASK_RUNNER) private readonly tasks: TaskRunner,
    @Inject(CLOCK) private readonly clock: Clock,
    @Inject(APP_CONFIG) private readonly cfg: AppConfig,
  ) {}

  /** Whether the customer asked for texts (their preferred channel). */
  prefersTexts(scope: Scope, customerId: number): boolean {
    return this.customers.get(scope, customerId).preferredChannel === 'sms';
  }

  /** The number a text to the customer would go to, or null when none can (no valid number, or they replied STOP). */
  numberFor(scope: Scope, customerId: number): string | null {
    const { number, optedOut } = this.customers.textNumber(scope, customerId);
    return optedOut ? null : number;
  }

  /** Queues the text in the caller's transaction (or its own); says why when it cannot go. */
  queue(scope: Scope, req: TextRequest, tx?: DbTx): TextQueued {
    const { number, optedOut } = this.customers.textNumber(scope, req.customerId);
    if (optedOut) return { status: 'not_sent', reason: 'The owner replied STOP and gets no more texts.' };
    if (!number) return { status: 'not_sent', reason: 'The owner has no valid mobile number on file.' };
    const body = textBody(req.kind, this.shops.settings(scope.shopId).name, req.link);
    const write = (t: DbTx): TextQueued => {
      const row = this.repo.insert(
        {
          ...{ shopId: scope.shopId, jobId: req.jobId, customerId: req.customerId, kind: req.kind, toNumber: number, ...this.sealed(body, req.link) },
          ...{ status: 'queued', createdAt: this.clock.now() },
        },
        t,
      );
      this.tasks.enqueue({ kind: TEXT_SEND, key: String(row.id), shopId: scope.shopId, payload: { textId: row.id } }, t);
      return { status: 'queued', id: row.id, to: number };
    };
    return tx ? write(tx) : this.uow.run(write);
  }

  /** The body as stored: the link only sealed (opened at send), a placeholder in its place. */
  private sealed(body: string, link: string | null): Pick<NewTextRow, 'body' | 'bodyAfterSend' | 'sealedSecrets'> {
    if (!link) return { body, bodyAfterSend: null, sealedSecrets: null };
    const bodyAfterSend = body.split(link).join(LINK_REMOVED);
    return { body: withPlaceholders(body, [link]), bodyAfterSend, sealedSecrets: sealSecrets(this.cfg.jwtSecret, [link]) };
  }

  listForJob(scope: Scope, jobId: number): TextMessageDto[] {
    this.access.read(scope, jobId);
    return this.repo.list(scope.shopId, { jobId }).map((r) => this.toDto(r));
  }

  listForCustomer(scope: Scope, customerId: number): TextMessageDto[] {
    this.customers.get(scope, customerId);
    return this.repo.list(scope.shopId, { customerId }).map((r) => this.toDto(r));
  }

  private toDto(r: TextRow): TextMessageDto {
    return {
      // Never the link itself: staff who may not send links see the text as it will be kept.
      ...{ id: r.id, jobId: r.jobId, customerId: r.customerId, kind: r.kind, to: r.toNumber, body: r.bodyAfterSend ?? r.body, status: r.status },
      ...{ attempts: r.attempts, maxAttempts: this.cfg.TEXT_MAX_ATTEMPTS, lastError: r.lastError },
      nextTryAt: r.status === 'queued' ? (this.tasks.status(TEXT_SEND, String(r.id))?.nextRunAt ?? null) : null,
      sentAt: r.sentAt?.toISOString() ?? null,
      statusAt: r.statusAt?.toISOString() ?? null,
      createdAt: r.createdAt.toISOString(),
    };
  }
}
