import type { Metadata } from "next";
import { AcceptInviteForm } from "@/components/auth/accept-invite-form";
import { AuthCard } from "@/components/auth/auth-card";
import { TextLink } from "@/components/ui/text-link";
import { describeInvitation, type InvitationInfoDto } from "@/lib/accounts/accept-invitation";
import { isAppError } from "@/lib/errors/app-error";
import { linkTokenField } from "@/lib/validations/fields";

export const metadata: Metadata = { title: "Join a shop" };

export default async function InvitePage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const parsed = linkTokenField.safeParse(token);

  let invitation: InvitationInfoDto | null = null;
  let problem: string | null = parsed.success ? null : (parsed.error.issues[0]?.message ?? "This link is not valid.");
  if (parsed.success) {
    try {
      invitation = await describeInvitation(parsed.data);
    } catch (err) {
      if (!isAppError(err)) throw err;
      problem = err.message;
    }
  }

  return (
    <AuthCard title="You are invited" lead="Join a Peelform shop and work on its builds.">
      {invitation && parsed.success ? (
        <AcceptInviteForm token={parsed.data} invitation={invitation} />
      ) : (
        <div className="flex flex-col gap-3 text-sm">
          <p role="alert" className="font-medium text-ember-700">
            This invitation cannot be used: {problem}
          </p>
          <p className="text-kraft-700">Invitations expire, and each works once. Ask the shop owner to send a new one.</p>
          <TextLink href="/sign-in">Go to sign in</TextLink>
        </div>
      )}
    </AuthCard>
  );
}
