"use client";

import Link from "next/link";
import { useRouter } from "next/navigation";
import { useEffect } from "react";
import { errorMessage } from "@/lib/client/api-fetch";
import { useFlattenJob } from "@/lib/client/scans/use-flatten-job";

const STATE_LABEL = { queued: "Waiting for a worker", active: "Cutting and flattening", completed: "Pattern ready", failed: "Failed" } as const;

/** Progress of a queued flatten (GET /api/jobs/[id] every second); opens the pattern when it is done. */
export function JobBar({ jobId, patternId }: { jobId: string; patternId: string }) {
  const job = useFlattenJob(jobId);
  const router = useRouter();
  const state = job.data?.state;
  const href = `/patterns/${encodeURIComponent(patternId)}`;
  useEffect(() => {
    if (state !== "completed") return;
    const t = window.setTimeout(() => router.push(href), 1200);
    return () => window.clearTimeout(t);
  }, [state, router, href]);

  if (job.isError) return <p role="alert" className="text-xs text-ember-700">Could not read the job: {errorMessage(job.error)}</p>;
  const progress = job.data?.progress ?? 0;
  return (
    <div className="flex flex-col gap-1" data-testid="flatten-job" data-state={state ?? "queued"}>
      <div className="flex justify-between text-xs text-kraft-700">
        <span>{state ? STATE_LABEL[state] : "Queued"}</span>
        <span>{progress} %</span>
      </div>
      <div role="progressbar" aria-label="Flatten progress" aria-valuemin={0} aria-valuemax={100} aria-valuenow={progress} className="h-2.5 w-full border border-kraft-500 bg-kraft-100">
        <div className={`h-full ${state === "failed" ? "bg-ember-700" : "bg-foam-600"} transition-[width]`} style={{ width: `${progress}%` }} />
      </div>
      {state === "failed" && job.data?.error ? <p role="alert" className="text-xs text-ember-700">{job.data.error}</p> : null}
      {state === "completed" ? <Link href={href} className="text-sm font-bold text-foam-800 underline">Open the pattern →</Link> : null}
    </div>
  );
}
