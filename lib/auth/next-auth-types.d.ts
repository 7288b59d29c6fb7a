import "next-auth";
import "next-auth/jwt";

/** What our sessions carry: the user id and the active shop id (see lib/auth/auth-options.ts). */
declare module "next-auth" {
  interface Session {
    user: { id: string; name: string; email: string };
    shopId: string | null;
  }
  interface User {
    id: string;
    name: string;
    email: string;
    shopId: string | null;
    sessionVersion: number;
  }
}

declare module "next-auth/jwt" {
  interface JWT {
    userId?: string;
    shopId?: string | null;
    /** users.session_version when the token was issued; a password change bumps it and ends older sessions. */
    sv?: number;
  }
}
