import { Inject, Injectable, Logger } from '@nestjs/common';
import { APP_CONFIG, type AppConfig } from '../config';
import { CLOCK, type Clock } from '../core/clock';
import { fillSecrets, openSecrets } from '../core/crypto';
import { CustomersService } from '../customers';
import { TEXT_PROVIDER, TextProvider, TextProviderError } from '../infra/texts';
import { PermanentTaskError, type TaskContext, TaskHandler } from '../infra/tasks';
import { type TextRow, TextsRepository } from './texts.repository';
import { TEXT_SEND } from './texts.service';

/** Where the provider reports a text's fate: from configuration (never a Host header), naming shop and text. */
export const statusCallbackUrl = (publicUrl: string, row: Pick<TextRow, 'shopId' | 'id'>): string =>
  `${publicUrl}/api/texts/status?shop=${row.shopId}&text=${row.id}`;

/**
 * Sends one queued text through the provider's SDK: the 'text.send' task. The task runner is its
 * only scheduler (TEXT_RETRY_BASE_MS, TEXT_MAX_ATTEMPTS, its lease after a crash); the row is the
 * record desk sees. A STOP that arrived after queueing wins: the text is marked and not sent.
 */
@Injectable()
export class TextDelivery {
  private readonly logger = new Logger('Texts');

  constructor(
    private readonly repo: TextsRepository,
    private readonly customers: CustomersService,
    @Inject(TEXT_PROVIDER) private readonly provider: TextProvider,
    @Inject(CLOCK) private readonly clock: Clock,
    @Inject(APP_CONFIG) private readonly cfg: AppConfig,
  ) {}

  @TaskHandler(TEXT_SEND, { concurrency: 2, maxAttempts: (cfg) => cfg.TEXT_MAX_ATTEMPTS, backoffBaseMs: (cfg) => cfg.TEXT_RETRY_BASE_MS })
  async deliver(task: TaskContext<typeof TEXT_SEND>): Promise<void> {
    const shopId = task.shopId ?? 0;
    const row = this.repo.claim(shopId, task.payload.textId);
    if (!row) return; // sent already
    if (this.customers.textNumber({ shopId }, row.customerId).optedOut) return this.repo.markOptedOut(shopId, row.id, this.clock.now());
    try {
      const body = fillSecrets(row.body, this.secrets(row));
      const sent = await this.provider.send(row.toNumber, body, statusCallbackUrl(this.cfg.publicUrl, row));
      this.repo.markSent(shopId, row.id, task.attempt, sent.sid, this.clock.now());
    } catch (err) {
      const message = err instanceof Error ? err.message : String(err);
      const permanent = err instanceof TextProviderError && err.permanent;
      const final = permanent || task.final;
      this.repo.markAttemptFailed(shopId, row.id, task.attempt, message, final);
      this.logger.warn(`Text ${row.id} attempt ${task.attempt} failed${final ? ' for good' : ''}: ${message}`);
      throw permanent ? new PermanentTaskError(message) : err;
    }
  }

  /** The text's sealed link, opened only for this send; a key that changed since it was queued cannot. */
  private secrets(row: TextRow): string[] {
    if (!row.sealedSecrets) return [];
    try {
      return openSecrets(this.cfg.jwtSecret, row.sealedSecrets);
    } catch {
      throw new TextProviderError('The link in this text was sealed with another server secret (JWT_SECRET changed); send a new link', true);
    }
  }
}
