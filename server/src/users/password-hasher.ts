import { Injectable } from '@nestjs/common';
import argon2 from 'argon2';

/** argon2id with the library's defaults (64 MiB, 3 passes), which follow RFC 9106's second recommendation. */
@Injectable()
export class PasswordHasher {
  /** Checked against when an address has no account, so both cases take about as long. */
  private readonly decoy = argon2.hash('decoy password of no account', { type: argon2.argon2id });

  hash(password: string): Promise<string> {
    return argon2.hash(password, { type: argon2.argon2id });
  }

  async verify(hash: string | undefined, password: string): Promise<boolean> {
    try {
      return await argon2.verify(hash ?? (await this.decoy), password);
    } catch {
      return false;
    }
  }
}
