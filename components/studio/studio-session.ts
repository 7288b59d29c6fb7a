import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { cache } from "react";
import { loadSession, type SessionContext } from "@/lib/api/session-context";
import { isAppError } from "@/lib/errors/app-error";

/**
 * Server-side session of a studio screen, loaded the same way the API loads it (lib/api/session-context.ts: the
 * next-auth cookie, then user and membership fresh from the database), once per request (React `cache`) so the
 * layout and the page share it. Redirects to sign-in without a valid session; `null` when the user belongs to no shop.
 */
export const getStudioSession = cache(async (): Promise<SessionContext | null> => {
  const h = await headers();
  const req = new Request("http://studio.invalid/", { headers: { cookie: h.get("cookie") ?? "" } });
  try {
    return await loadSession(req);
  } catch (err) {
    if (isAppError(err) && err.code === "UNAUTHENTICATED") redirect("/sign-in");
    if (isAppError(err) && err.code === "FORBIDDEN") return null;
    throw err;
  }
});
