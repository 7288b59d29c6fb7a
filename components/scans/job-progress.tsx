"use client";

import { useEffect } from "react";
import { useQueryClient } from "@tanstack/react-query";
import { errorMessage } from "@/lib/client/api-fetch";
import { scanKeys, useJob } from "./use-scan-queries";

const STATE_LABEL = { queued: "Waiting for a worker", active: "Flattening", completed: "Done", failed: "Failed" } as const;

/** A flatten job's progress bar, polling GET /api/jobs/[id]; refreshes the pattern list when the job ends. */
export function JobProgress({ jobId, projectId }: { jobId: string; projectId: string }) {
  const job = useJob(jobId);
  const client = useQueryClient();
  const state = job.data?.state;
  useEffect(() => {
    if (state === "completed" || state === "failed") void client.invalidateQueries({ queryKey: scanKeys.patterns(projectId) });
  }, [state, client, projectId]);

  if (job.isError) return <p role="alert" className="text-xs text-ember-700">Could not read the job: {errorMessage(job.error)}</p>;
  const progress = job.data?.progress ?? 0;
  return (
    <div className="flex flex-col gap-1" data-testid="job-progress">
      <div className="flex justify-between text-xs text-kraft-700">
        <span>{state ? STATE_LABEL[state] : "Queued"}</span>
        <span>{progress} %</span>
      </div>
      <div
        role="progressbar"
        aria-label="Flatten progress"
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={progress}
        className="h-2 w-full border border-kraft-500 bg-kraft-100"
      >
        <div className={`h-full ${state === "failed" ? "bg-ember-700" : "bg-foam-600"} transition-[width]`} style={{ width: `${progress}%` }} />
      </div>
      {state === "failed" && job.data?.error ? <p role="alert" className="text-xs text-ember-700">{job.data.error}</p> : null}
    </div>
  );
}
