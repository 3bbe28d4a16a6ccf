// Tells Express's types that req.user is our signed-in user, (csrf-sync declares the session's token itself).
import type { SessionUser } from '../../shared/users/user-schemas.js';

declare global {
  namespace Express {
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type
    interface User extends SessionUser {}
  }
}

export {};
