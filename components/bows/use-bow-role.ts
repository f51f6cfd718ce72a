import { useMe } from '@/components/auth/api';
import type { Bow } from '@/shared/bow';

/** What the signed-in user may do with a bow's records. */
export interface BowRole {
  /** The bow is theirs: they may edit it, add builds, change and delete its records, share it. */
  isOwner: boolean;
  /** They may add arrow builds, sight-ins, marks, tapes, level checks and change notes (the owner, or a technician it is shared with), each attributed to them. */
  canAdd: boolean;
}

/**
 * The one place the screens decide what to offer on a bow, mirroring the
 * server's rule (server/services/bow-access.ts): whoever can read a bow (its
 * owner, or a technician with an active share) may add records to it; only its
 * owner may edit or delete the bow's records. Until the account has loaded,
 * nothing is offered. The server still checks every request.
 * Example: `const { isOwner, canAdd } = useBowRole(bow.data)` → { isOwner: false, canAdd: true } for a technician
 */
export function useBowRole(bow: Pick<Bow, 'userId'> | undefined): BowRole {
  const me = useMe();
  if (!me.data || !bow) return { isOwner: false, canAdd: false };
  // A bow the user could load is one they may read, and so add to (read and write go together).
  return { isOwner: me.data.id === bow.userId, canAdd: true };
}
