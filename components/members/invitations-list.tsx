"use client";

import { Button } from "@/components/ui/button";
import { useToast } from "@/components/toast/toast-provider";
import { errorMessage } from "@/lib/client/api-fetch";
import { ROLE_LABELS, type Invitation } from "@/lib/client/api-types";
import { formatDay } from "@/lib/client/format";
import { useRevokeInvitation } from "@/lib/client/use-members";

/** Invitations that were sent and not yet accepted; each can be withdrawn (its link stops working). */
export function InvitationsList({ invitations }: { invitations: Invitation[] }) {
  const toast = useToast();
  const revoke = useRevokeInvitation();

  if (invitations.length === 0) {
    return <p className="text-sm text-kraft-700">No open invitations.</p>;
  }
  return (
    <ul className="flex flex-col divide-y divide-kraft-100" aria-label="Open invitations">
      {invitations.map((inv) => (
        <li key={inv.id} className="flex flex-wrap items-center justify-between gap-2 py-2 text-sm" data-invitation-email={inv.email}>
          <span className="min-w-0">
            <span className="block break-all font-medium">{inv.email}</span>
            <span className="block text-xs text-kraft-700">
              {ROLE_LABELS[inv.role] ?? inv.role} · expires {formatDay(inv.expiresAt)}
            </span>
          </span>
          <Button
            variant="ghost"
            className="px-2 py-1 text-xs"
            aria-label={`Withdraw the invitation for ${inv.email}`}
            disabled={revoke.isPending}
            onClick={() =>
              revoke.mutate(inv.id, {
                onSuccess: () => toast.success(`Invitation for ${inv.email} withdrawn.`),
                onError: (err) => toast.error(errorMessage(err)),
              })
            }
          >
            Withdraw
          </Button>
        </li>
      ))}
    </ul>
  );
}
