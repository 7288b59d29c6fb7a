"use client";

import { Panel } from "@/components/ui/panel";
import { errorMessage } from "@/lib/client/api-fetch";
import { useMembers } from "@/lib/client/use-members";
import { InvitationsList } from "./invitations-list";
import { InviteForm } from "./invite-form";
import { MembersTable } from "./members-table";

/** Members and invitations of the active shop; invite and manage only for roles that may. */
export function MembersBoard({ canInvite, canManage, currentUserId }: { canInvite: boolean; canManage: boolean; currentUserId: string }) {
  const query = useMembers();

  return (
    <div className="flex flex-col gap-6">
      {canInvite ? (
        <div className="grid gap-6 md:grid-cols-2">
          <Panel title="Invite someone">
            <InviteForm />
          </Panel>
          <Panel title="Open invitations">
            {query.data ? <InvitationsList invitations={query.data.invitations} /> : <p className="text-sm text-kraft-700">…</p>}
          </Panel>
        </div>
      ) : null}
      <Panel title="People in this shop">
        {query.isPending ? (
          <p role="status" className="text-sm text-kraft-700">Loading members…</p>
        ) : query.isError ? (
          <p role="alert" className="text-sm text-ember-700">Could not load members: {errorMessage(query.error)}</p>
        ) : (
          <MembersTable members={query.data.members} canManage={canManage} currentUserId={currentUserId} />
        )}
      </Panel>
    </div>
  );
}
