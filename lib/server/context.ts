/** Who is asking: built by the wrappers from the session, re-read from the database. */
import type { Role } from '@/lib/auth/roles';

export interface SessionUser {
  id: string;
  email: string;
  name: string;
  workspaceId: string;
  workspaceName: string;
  membershipId: string;
  roles: Role[];
}

export interface Ctx {
  user: SessionUser;
  /** Client address as the request reported it (first X-Forwarded-For entry). */
  ip: string | null;
}
