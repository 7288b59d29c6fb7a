import { ROLE_LABELS, type Invitation } from "@/lib/client/api-types";
import { formatDay } from "@/lib/client/format";

/** Invitations that were sent and not yet accepted. */
export function InvitationsList({ invitations }: { invitations: Invitation[] }) {
  if (invitations.length === 0) {
    return <p className="text-sm text-kraft-700">No open invitations.</p>;
  }
  return (
    <ul className="flex flex-col divide-y divide-kraft-100" aria-label="Open invitations">
      {invitations.map((inv) => (
        <li key={inv.id} className="flex flex-wrap items-baseline justify-between gap-2 py-2 text-sm" data-invitation-email={inv.email}>
          <span className="break-all font-medium">{inv.email}</span>
          <span className="text-xs text-kraft-700">
            {ROLE_LABELS[inv.role] ?? inv.role} · expires {formatDay(inv.expiresAt)}
          </span>
        </li>
      ))}
    </ul>
  );
}
