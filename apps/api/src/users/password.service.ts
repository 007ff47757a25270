import { hash, verify } from '@node-rs/argon2';
import { Injectable } from '@nestjs/common';

/** argon2id with the library's defaults (about 46 ms a hash on this class of machine). */
@Injectable()
export class PasswordService {
  private dummyHash: Promise<string> | undefined;

  hash(password: string): Promise<string> {
    return hash(password);
  }

  verify(passwordHash: string, password: string): Promise<boolean> {
    return verify(passwordHash, password);
  }

  /**
   * Spends the time of one verification for an unknown e-mail, so the response time
   * does not tell whether an account exists.
   */
  async verifyNothing(password: string): Promise<false> {
    this.dummyHash ??= hash('not-a-password-of-anyone');
    await verify(await this.dummyHash, password);
    return false;
  }
}
