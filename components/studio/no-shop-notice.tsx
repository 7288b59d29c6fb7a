import { Panel } from "@/components/ui/panel";
import { SignOutButton } from "./sign-out-button";

/** Shown instead of a studio screen when the signed-in person no longer belongs to any shop. */
export function NoShopNotice() {
  return (
    <Panel title="No shop">
      <div className="flex flex-col items-start gap-3 text-sm">
        <p>You are not a member of any shop right now.</p>
        <p className="text-kraft-700">Ask a shop owner to invite you again, or sign out and create a shop of your own.</p>
        <SignOutButton tone="dark" />
      </div>
    </Panel>
  );
}
