import { Inject, Injectable } from '@nestjs/common';
import type { RecoveryCodes, TotpEnrolment, TwoFactorStatus } from '@benchproof/contracts';
import { AuditService } from '../audit';
import { APP_CONFIG, type AppConfig } from '../config';
import { SessionStore, type AuthUser } from '../core/auth';
import { UnitOfWork } from '../core/db';
import { DomainError } from '../core/http';
import { CLOCK, type Clock } from '../core/clock';
import { ShopsService } from '../shops';
import { UsersService } from '../users';
import { RecoveryCodesRepository } from './recovery-codes.repository';
import { hashRecoveryCode, newRecoveryCodes, newTotpSecret, openSecret, sealSecret, totpStep, totpUri } from './totp';

/** Where a user stands at sign-in: a confirmed second factor, or one the shop requires but they have not set up. */
export interface SecondFactorNeed {
  enabled: boolean;
  required: boolean;
}

/** TOTP enrolment, checking codes at sign-in, recovery codes and the shop's requirement. */
@Injectable()
export class TwoFactorService {
  constructor(
    private readonly users: UsersService,
    private readonly uow: UnitOfWork,
    private readonly shops: ShopsService,
    private readonly codes: RecoveryCodesRepository,
    private readonly sessions: SessionStore,
    private readonly audit: AuditService,
    @Inject(CLOCK) private readonly clock: Clock,
    @Inject(APP_CONFIG) private readonly cfg: AppConfig,
  ) {}

  need(user: AuthUser): SecondFactorNeed {
    return { enabled: this.users.totpState(user.shopId, user.id).enabled, required: this.shops.requiresTwoFactor(user.shopId) };
  }

  status(user: AuthUser): TwoFactorStatus {
    const need = this.need(user);
    return { enabled: need.enabled, requiredByShop: need.required, recoveryCodesLeft: this.codes.unusedCount(user.shopId, user.id) };
  }

  /** A new secret (not active until confirmed with a code); replaces an unfinished one. A confirmed one must be turned off first. */
  async start(user: AuthUser): Promise<TotpEnrolment> {
    if (this.users.totpState(user.shopId, user.id).enabled)
      throw new DomainError('CONFLICT', 'Two-step sign-in is already on. Turn it off first to move it to another phone.');
    const secret = newTotpSecret();
    this.users.setTotp(user.shopId, user.id, sealSecret(this.cfg.jwtSecret, secret), false);
    const otpauthUrl = totpUri(secret, user.email, `BenchProof ${this.shops.settings(user.shopId).name}`);
    // The QR encoder loads with the first set-up, not at boot (about 9 MB resident, issue 22).
    const { default: QRCode } = await import('qrcode');
    const qrSvg = await QRCode.toString(otpauthUrl, { type: 'svg', errorCorrectionLevel: 'M', margin: 2 });
    return { secret, otpauthUrl, qrSvg };
  }

  /** Confirms the enrolment with a first code and hands out ten recovery codes, shown this once. */
  confirm(user: AuthUser, code: string): RecoveryCodes {
    const state = this.users.totpState(user.shopId, user.id);
    if (!state.sealedSecret || state.enabled) throw new DomainError('CONFLICT', 'Start setting up two-step sign-in first.');
    const step = totpStep(openSecret(this.cfg.jwtSecret, state.sealedSecret), code, this.epochSeconds());
    if (step === null) throw new DomainError('CODE_INVALID', undefined, { field: 'code' });
    const recoveryCodes = newRecoveryCodes();
    this.uow.run(() => {
      this.users.setTotp(user.shopId, user.id, state.sealedSecret, true);
      this.users.takeTotpStep(user.shopId, user.id, step);
      this.codes.replace(user.shopId, user.id, recoveryCodes.map(hashRecoveryCode), this.clock.now());
    });
    this.audit.record(user, { action: 'user.two_factor_on', entityType: 'user', entityId: user.id, details: {} });
    return { recoveryCodes };
  }

  /** A six-digit code (each time step once) or an unused recovery code; true when it lets the user in. */
  check(user: AuthUser, code: string): boolean {
    const state = this.users.totpState(user.shopId, user.id);
    if (!state.enabled || !state.sealedSecret) return false;
    if (/^\d{6}$/.test(code)) {
      const step = totpStep(openSecret(this.cfg.jwtSecret, state.sealedSecret), code, this.epochSeconds());
      return step !== null && this.users.takeTotpStep(user.shopId, user.id, step);
    }
    const used = this.codes.use(user.shopId, user.id, hashRecoveryCode(code), this.clock.now());
    if (used) this.audit.record(user, { action: 'user.recovery_code_used', entityType: 'user', entityId: user.id, details: {} });
    return used;
  }

  /** Turns the second factor off after the password is checked again; not while the shop requires it. */
  async disable(user: AuthUser, password: string): Promise<void> {
    if (this.shops.requiresTwoFactor(user.shopId)) throw new DomainError('TWO_FACTOR_REQUIRED');
    if (!(await this.users.passwordMatches(user, password))) throw new DomainError('INVALID_CREDENTIALS', 'The password is not right.', { field: 'password' });
    this.uow.run(() => {
      this.users.setTotp(user.shopId, user.id, null, false);
      this.codes.clear(user.shopId, user.id);
    });
    this.audit.record(user, { action: 'user.two_factor_off', entityType: 'user', entityId: user.id, details: {} });
  }

  /**
   * A manager requires (or stops requiring) a second factor for every account. Turning it on needs the
   * manager's own factor first, and ends every session of accounts without one, so nobody keeps working
   * on a session that skipped the code: they set it up at their next sign-in.
   */
  setRequired(manager: AuthUser, required: boolean): { required: boolean; signedOut: number } {
    if (required && !this.users.totpState(manager.shopId, manager.id).enabled) {
      throw new DomainError('CONFLICT', 'Turn on two-step sign-in for your own account first.');
    }
    const without = required ? this.users.withoutTwoFactor(manager.shopId) : [];
    this.uow.run(() => {
      this.shops.setRequireTwoFactor(manager, required);
      for (const id of without) this.sessions.endAllOf(manager.shopId, id);
    });
    return { required, signedOut: without.length };
  }

  private epochSeconds(): number {
    return Math.floor(this.clock.now().getTime() / 1000);
  }
}
