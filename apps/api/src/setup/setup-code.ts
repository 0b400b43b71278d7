import { Inject, Injectable, Logger, type OnApplicationBootstrap } from '@nestjs/common';
import { randomInt, timingSafeEqual, createHash } from 'node:crypto';
import { APP_CONFIG, type AppConfig } from '../config';
import { ShopsService } from '../shops';

const ALPHABET = 'ABCDEFGHJKLMNPQRSTUVWXYZ23456789';

/** Four groups of four from an alphabet without look-alikes: 80 bits, easy to read off a terminal. */
export const newSetupCode = (): string =>
  Array.from({ length: 4 }, () => Array.from({ length: 4 }, () => ALPHABET[randomInt(ALPHABET.length)]).join('')).join('-');

const digest = (code: string): Buffer => createHash('sha256').update(code.replace(/[\s-]/g, '').toUpperCase()).digest();

/**
 * The one-time code that proves the person at the setup screen can read the server's output, so a
 * stranger who reaches a fresh server first cannot claim it. Printed at start while there is no shop
 * (SETUP_CODE fixes it, e.g. for automated installs); forgotten once the first shop exists.
 */
@Injectable()
export class SetupCode implements OnApplicationBootstrap {
  private code: string | null = null;

  constructor(
    private readonly shops: ShopsService,
    @Inject(APP_CONFIG) private readonly cfg: AppConfig,
  ) {}

  onApplicationBootstrap(): void {
    if (this.shops.anyShop()) return;
    this.code = this.cfg.SETUP_CODE ?? newSetupCode();
    // Straight to stdout as well as the log: the operator must see it even with LOG_LEVEL=warn.
    const line = `BenchProof has no workshop yet. Open the web app and enter this one-time setup code: ${this.code}`;
    new Logger('Setup').log(line);
    if (this.cfg.LOG_LEVEL !== 'silent') process.stdout.write(`\n  ${line}\n\n`);
  }

  /** Whether the code matches (spaces, dashes and case ignored), compared in constant time. */
  matches(given: string): boolean {
    return this.code !== null && timingSafeEqual(digest(given), digest(this.code));
  }

  /** The code, for the test harness only (it cannot read the server's output). */
  current(): string | null {
    return this.code;
  }

  forget(): void {
    this.code = null;
  }
}
