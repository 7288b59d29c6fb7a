import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { MembersBoard } from "@/components/members/members-board";
import { RoleGuide } from "@/components/members/role-guide";
import { PageHeading } from "@/components/studio/page-heading";
import { getStudioSession } from "@/components/studio/studio-session";
import { Panel } from "@/components/ui/panel";
import { can } from "@/lib/permissions/permissions";

export const metadata: Metadata = { title: "Members" };

export default async function MembersPage() {
  const session = await getStudioSession();
  if (!session) return null;
  if (!can(session.role, "member:read")) notFound();
  const canManage = can(session.role, "member:manage");

  return (
    <>
      <PageHeading
        eyebrow={session.shop.name}
        title="Members"
        lead={canManage ? "Invite people, set their roles, or remove them." : "The people you work with in this shop."}
      />
      <MembersBoard canInvite={can(session.role, "invitation:create")} canManage={canManage} currentUserId={session.user.id} />
      <div className="mt-6">
        <Panel title="Roles">
          <RoleGuide />
        </Panel>
      </div>
    </>
  );
}
