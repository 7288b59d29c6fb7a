"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { useToast } from "@/components/toast/toast-provider";
import { errorMessage } from "@/lib/client/api-fetch";
import { ROLE_LABELS, ROLES, type Member, type ShopRole } from "@/lib/client/api-types";
import { formatDay } from "@/lib/client/format";
import { useChangeMemberRole, useRemoveMember } from "@/lib/client/use-members";

/**
 * The people in the shop. Role changes and removal are shown only when `canManage` (the server checks again;
 * the last owner cannot be demoted or removed and the server answers 409 with its reason).
 */
export function MembersTable({ members, canManage, currentUserId }: { members: Member[]; canManage: boolean; currentUserId?: string }) {
  return (
    <div className="-mx-5 overflow-x-auto">
      <table className="w-full min-w-[32rem] border-collapse text-sm">
        <caption className="sr-only">Members of this shop</caption>
        <thead>
          <tr className="border-b border-kraft-200 text-left text-xs uppercase tracking-wider text-kraft-700">
            <th scope="col" className="px-5 py-2 font-bold">Member</th>
            <th scope="col" className="px-3 py-2 font-bold">Role</th>
            <th scope="col" className="px-3 py-2 font-bold">Joined</th>
            {canManage ? <th scope="col" className="px-5 py-2 text-right font-bold">Actions</th> : null}
          </tr>
        </thead>
        <tbody>
          {members.map((m) => (
            <MemberRow key={m.id} member={m} canManage={canManage} isSelf={m.userId === currentUserId} />
          ))}
        </tbody>
      </table>
    </div>
  );
}

function MemberRow({ member, canManage, isSelf }: { member: Member; canManage: boolean; isSelf: boolean }) {
  const toast = useToast();
  const changeRole = useChangeMemberRole();
  const remove = useRemoveMember();
  const [confirming, setConfirming] = useState(false);
  const selectId = `role-${member.id}`;

  return (
    <tr className="border-b border-kraft-100 last:border-0" data-member-email={member.email}>
      <th scope="row" className="px-5 py-3 text-left font-medium">
        <span className="block">
          {member.name}
          {isSelf ? <span className="ml-2 border border-kraft-500 px-1 text-xs font-normal text-kraft-700">you</span> : null}
        </span>
        <span className="block break-all text-xs font-normal text-kraft-700" data-testid="member-email">
          {member.email}
        </span>
      </th>
      <td className="px-3 py-3">
        {canManage ? (
          <>
            <label htmlFor={selectId} className="sr-only">
              Role of {member.name}
            </label>
            <select
              id={selectId}
              value={member.role}
              disabled={changeRole.isPending}
              onChange={(e) => {
                const role = e.target.value as ShopRole;
                changeRole.mutate(
                  { id: member.id, role },
                  {
                    onSuccess: () => toast.success(`${member.name} is now ${ROLE_LABELS[role].toLowerCase()}.`),
                    onError: (err) => toast.error(errorMessage(err)),
                  },
                );
              }}
              className="border border-kraft-500 bg-white px-2 py-1 text-sm focus:outline-2 focus:outline-foam-400"
            >
              {ROLES.map((r) => (
                <option key={r} value={r}>
                  {ROLE_LABELS[r]}
                </option>
              ))}
            </select>
          </>
        ) : (
          <span>{ROLE_LABELS[member.role] ?? member.role}</span>
        )}
      </td>
      <td className="px-3 py-3 whitespace-nowrap">{formatDay(member.joinedAt)}</td>
      {canManage ? (
        <td className="px-5 py-3 text-right whitespace-nowrap">
          {confirming ? (
            <span className="inline-flex items-center gap-2">
              <Button
                variant="danger"
                className="px-3 py-1"
                busy={remove.isPending}
                onClick={() =>
                  remove.mutate(member.id, {
                    onSuccess: () => toast.success(`${member.name} was removed from the shop.`),
                    onError: (err) => {
                      setConfirming(false);
                      toast.error(errorMessage(err));
                    },
                  })
                }
              >
                Confirm removal
              </Button>
              <Button variant="ghost" className="px-3 py-1" onClick={() => setConfirming(false)}>
                Keep
              </Button>
            </span>
          ) : (
            <Button variant="secondary" className="px-3 py-1" onClick={() => setConfirming(true)} aria-label={`Remove ${member.name}`}>
              Remove
            </Button>
          )}
        </td>
      ) : null}
    </tr>
  );
}
