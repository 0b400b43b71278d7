import { DomainInputError } from './errors';
import { requireInteger } from './numeric';

const JOB_NUMBER = /^J-(\d{4})-(\d{4,})$/;

/**
 * Human-friendly job number "J-2026-0042": year of booking and the shop's own
 * sequence, zero-padded to 4 digits (more digits once a shop passes 9999 in a
 * year). Unique per shop because the sequence is per shop and year; the
 * database enforces it.
 */
export function formatJobNumber(year: number, seq: number): string {
  requireInteger('year', year, { min: 2000, max: 9999 });
  requireInteger('sequence', seq, { min: 1 });
  return `J-${year}-${String(seq).padStart(4, '0')}`;
}

/** Reads a job number back into year and sequence; throws DomainInputError on anything else. */
export function parseJobNumber(value: string): { year: number; seq: number } {
  const text = value.trim().toUpperCase();
  const match = JOB_NUMBER.exec(text);
  const year = match ? Number(match[1]) : 0;
  const seq = match ? Number(match[2]) : 0;
  // Only the canonical spelling counts, so one job cannot have two numbers.
  if (!match || year < 2000 || seq < 1 || formatJobNumber(year, seq) !== text) {
    throw new DomainInputError('INVALID_FORMAT', `Not a job number: "${value}" (expected like J-2026-0042).`, { value });
  }
  return { year, seq };
}
