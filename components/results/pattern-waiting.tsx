"use client";

import { useEffect } from "react";
import { useRouter } from "next/navigation";
import { usePattern } from "@/lib/client/patterns/use-pattern";
import type { PatternDto } from "@/lib/patterns-store/pattern-dto";
import { errorMessage } from "@/lib/client/api-fetch";

/** While the pattern is queued or being made: a status line that reloads the screen once it is ready or failed. */
export function PatternWaiting({ initial }: { initial: PatternDto }) {
  const pattern = usePattern(initial.id, initial);
  const router = useRouter();
  const status = pattern.data?.status ?? initial.status;
  useEffect(() => {
    if (status === "ready" || status === "failed") router.refresh();
  }, [status, router]);

  if (pattern.isError) return <p role="alert" className="text-sm text-ember-700">Could not read the pattern: {errorMessage(pattern.error)}</p>;
  return (
    <p role="status" className="flex items-center gap-2 text-sm text-kraft-700">
      <span aria-hidden="true" className="inline-block h-3 w-3 animate-spin border-2 border-foam-600 border-t-transparent" />
      {status === "queued" ? "Waiting for a worker to start on this pattern…" : "Cutting and flattening the pieces…"} This page updates by itself.
    </p>
  );
}
