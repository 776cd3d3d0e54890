import { describe, expect, it } from 'vitest';
import { MAX_PASSWORD_LENGTH, MIN_PASSWORD_LENGTH, passwordProblem } from './passwords.js';

// NIST SP 800-63B 5.1.1.2: a minimum length, every printing character and space allowed, no composition rules, a blocklist.
describe('passwordProblem', () => {
  it('counts characters as code points, so an emoji is one', () => {
    expect(passwordProblem('🌋'.repeat(MIN_PASSWORD_LENGTH - 1))).toBe('tooShort');
    expect(passwordProblem('🌋'.repeat(MIN_PASSWORD_LENGTH))).toBeNull();
  });

  it('refuses a password of spaces alone, however long, and takes spaces inside a phrase', () => {
    expect(passwordProblem(' '.repeat(20))).toBe('onlySpaces');
    expect(passwordProblem('plates   drift   slowly')).toBeNull();
  });

  it('asks no composition: lower-case words pass', () => {
    expect(passwordProblem('sea floor spreads')).toBeNull();
  });

  it('refuses what the list lookup calls common, and more than the longest length', () => {
    expect(passwordProblem('a listed password', (p) => p === 'a listed password')).toBe('common');
    expect(passwordProblem('x'.repeat(MAX_PASSWORD_LENGTH + 1))).toBe('tooLong');
  });
});
