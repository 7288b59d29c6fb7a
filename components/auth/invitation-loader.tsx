"use client";

import { useEffect, useState } from "react";
import { TextLink } from "@/components/ui/text-link";
import { apiFetch, errorMessage } from "@/lib/client/api-fetch";
import type { InvitationInfo } from "@/lib/client/api-types";
import { AcceptInviteForm } from "./accept-invite-form";

type State = { kind: "loading" } | { kind: "ready"; invitation: InvitationInfo } | { kind: "failed"; message: string };

/** Looks the invitation up (GET /api/invitations/[token]) and shows the accept form, or why the link does not work. */
export function InvitationLoader({ token }: { token: string }) {
  const [state, setState] = useState<State>({ kind: "loading" });

  useEffect(() => {
    const ctrl = new AbortController();
    apiFetch<InvitationInfo>(`/api/invitations/${encodeURIComponent(token)}`, { signal: ctrl.signal })
      .then((invitation) => setState({ kind: "ready", invitation }))
      .catch((err: unknown) => {
        if (ctrl.signal.aborted) return;
        setState({ kind: "failed", message: errorMessage(err) });
      });
    return () => ctrl.abort();
  }, [token]);

  if (state.kind === "loading") return <p role="status" className="text-sm text-kraft-700">Checking the invitation…</p>;
  if (state.kind === "failed") {
    return (
      <div className="flex flex-col gap-3 text-sm">
        <p role="alert" className="font-medium text-ember-700">
          This invitation cannot be used: {state.message}
        </p>
        <p className="text-kraft-700">Invitations expire, and each works once. Ask the shop owner to send a new one.</p>
        <TextLink href="/sign-in">Go to sign in</TextLink>
      </div>
    );
  }
  return <AcceptInviteForm token={token} invitation={state.invitation} />;
}
