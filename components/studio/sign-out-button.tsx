"use client";

import { signOut } from "next-auth/react";
import { useState } from "react";
import { Button } from "@/components/ui/button";

export function SignOutButton({ tone = "light" }: { tone?: "light" | "dark" }) {
  const [busy, setBusy] = useState(false);
  return (
    <Button
      variant="ghost"
      busy={busy}
      className={tone === "light" ? "text-white hover:bg-foam-600" : ""}
      onClick={async () => {
        setBusy(true);
        await signOut({ callbackUrl: "/sign-in" });
      }}
    >
      Sign out
    </Button>
  );
}
