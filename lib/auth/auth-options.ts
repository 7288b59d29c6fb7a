import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { authSecret, SESSION_MAX_AGE_SECONDS, useSecureCookies } from "@/lib/auth/auth-config";
import { authorizeCredentials } from "@/lib/auth/authorize-credentials";
import { clientIp } from "@/lib/rate-limit/limits";
import { getSequelize } from "@/lib/db/sequelize";
import { Membership } from "@/models";

/**
 * next-auth v4: e-mail + password (credentials provider, fields `email` and `password`), JWT sessions that carry the
 * user id (`userId`) and the active shop id (`shopId`). Cookies are next-auth's defaults (httpOnly, SameSite=Lax),
 * secure with the `__Secure-` prefix when APP_URL is https. Every API request re-checks the user and membership in
 * the database (lib/api/route-handler.ts), so a removed member or a changed role takes effect at once.
 *
 * The active shop changes through POST /api/me/shop (which re-issues the cookie) or `useSession().update({ shopId })`
 * (checked against the memberships here).
 */
export const authOptions: NextAuthOptions = {
  session: { strategy: "jwt", maxAge: SESSION_MAX_AGE_SECONDS },
  get useSecureCookies() {
    return useSecureCookies();
  },
  get secret() {
    return authSecret();
  },
  pages: { signIn: "/sign-in" },
  providers: [
    CredentialsProvider({
      id: "credentials",
      name: "E-mail and password",
      credentials: {
        email: { label: "E-mail", type: "email" },
        password: { label: "Password", type: "password" },
      },
      authorize: (credentials, req) => authorizeCredentials(credentials, clientIp(req?.headers as Record<string, string> | undefined)),
    }),
  ],
  callbacks: {
    async jwt({ token, user, trigger, session }) {
      if (user) {
        token.userId = user.id;
        token.shopId = user.shopId;
        token.sv = user.sessionVersion;
      }
      const wanted = (session as { shopId?: unknown } | undefined)?.shopId;
      if (trigger === "update" && typeof wanted === "string" && token.userId) {
        getSequelize();
        const membership = /^[0-9a-f-]{36}$/i.test(wanted)
          ? await Membership.findOne({ where: { userId: token.userId, shopId: wanted } })
          : null;
        if (membership) token.shopId = membership.shopId;
      }
      return token;
    },
    async session({ session, token }) {
      session.user = { id: token.userId ?? "", name: token.name ?? "", email: token.email ?? "" };
      session.shopId = token.shopId ?? null;
      return session;
    },
  },
};
