// bcrypt hashing with the configured cost (default 12).
import bcrypt from 'bcryptjs';

export class PasswordHasher {
  constructor(readonly cost: number) {}

  hash(password: string): Promise<string> {
    return bcrypt.hash(password, this.cost);
  }

  verify(password: string, hash: string): Promise<boolean> {
    return bcrypt.compare(password, hash);
  }

  /** A hash of nothing usable, compared against when the account is unknown so timing does not reveal it. */
  readonly decoy = bcrypt.hashSync('no account has this password', 4);
}
