import { withAuth } from "next-auth/middleware";
import { authSecret, sessionCookieName } from "@/lib/auth/auth-config";

/**
 * Next 16 proxy (formerly middleware): signed-out visitors of app pages are sent to /sign-in?callbackUrl=…
 * It only checks that a valid next-auth session cookie exists; roles and shop membership are checked by the API
 * wrapper and the pages themselves.
 *
 * Protected: every path EXCEPT (see `matcher`)
 *   /                      landing page
 *   /api/…                 the API answers 401 JSON itself (lib/api/route-handler.ts)
 *   /sign-in, /sign-up, /forgot-password, /reset-password/…, /invite/…   signed-out flows
 *   /mailbox/…             dev mailbox (its layout checks DEV_MAILBOX)
 *   /_next/…, /favicon.ico and any path with a file extension (static files in public/)
 */
export default withAuth({
  pages: { signIn: "/sign-in" },
  get secret() {
    return authSecret();
  },
  cookies: {
    sessionToken: {
      get name() {
        return sessionCookieName();
      },
    },
  },
} as Parameters<typeof withAuth>[0]);

export const config = {
  matcher: [
    "/((?!api/|api$|_next/|favicon\\.ico$|sign-in|sign-up|forgot-password|reset-password|invite/|mailbox|.*\\.[A-Za-z0-9]+$).+)",
  ],
};
