"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { FormAlert } from "@/components/ui/form-alert";
import { SelectField, TextField } from "@/components/ui/field";
import { errorMessage } from "@/lib/client/api-fetch";
import { FOAM_MATERIALS } from "@/lib/patterns/materials";
import { PAPER_IDS, PAPER_SIZES } from "@/lib/patterns/paper-sizes";
import { flattenParamsSchema, type FlattenParamsInput } from "@/lib/validations/flatten";
import { JobProgress } from "./job-progress";
import { useFlatten } from "./use-scan-queries";

const MATERIAL_OPTIONS = FOAM_MATERIALS.map((m) => ({ value: m.id, label: m.name }));
const PAPER_OPTIONS = PAPER_IDS.map((p) => ({ value: p, label: p === "full" ? "Full size (one page)" : PAPER_SIZES[p].name }));

/**
 * Basic flatten parameters for the scan's latest seam map: foam, thickness, size (percent or target width) and
 * paper. Checked with the API's own schema before sending; the job's progress shows below once queued.
 */
export function FlattenForm({ projectId, scanId, seamMapVersion }: { projectId: string; scanId: string; seamMapVersion: number | null }) {
  const flatten = useFlatten(projectId, scanId);
  const [material, setMaterial] = useState("eva");
  const [thickness, setThickness] = useState("6");
  const [percent, setPercent] = useState("100");
  const [targetWidth, setTargetWidth] = useState("");
  const [paper, setPaper] = useState("letter");
  const [problem, setProblem] = useState<string | null>(null);
  const [jobId, setJobId] = useState<string | null>(null);
  const id = (name: string) => `flatten-${scanId}-${name}`;

  return (
    <div className="flex flex-col gap-3">
      <form
        className="grid gap-3 sm:grid-cols-2"
        onSubmit={(e) => {
          e.preventDefault();
          const input: FlattenParamsInput = {
            material,
            thicknessMm: Number(thickness),
            paper: paper as FlattenParamsInput["paper"],
            ...(targetWidth.trim() ? { targetWidth: targetWidth.trim() } : { scale: Number(percent) / 100 }),
          };
          const parsed = flattenParamsSchema.safeParse(input);
          if (!parsed.success) {
            setProblem(parsed.error.issues[0]?.message ?? "Check the parameters.");
            return;
          }
          setProblem(null);
          flatten.mutate(input, { onSuccess: (r) => setJobId(r.jobId) });
        }}
      >
        <SelectField id={id("material")} label="Foam" options={MATERIAL_OPTIONS} value={material} onChange={(e) => setMaterial(e.target.value)} />
        <TextField id={id("thickness")} label="Thickness (mm)" inputMode="decimal" value={thickness} onChange={(e) => setThickness(e.target.value)} />
        <TextField id={id("percent")} label="Scale (%)" inputMode="decimal" value={percent} disabled={targetWidth.trim() !== ""} onChange={(e) => setPercent(e.target.value)} />
        <TextField id={id("target")} label="Or target width" placeholder="e.g. 250mm or 10in" value={targetWidth} onChange={(e) => setTargetWidth(e.target.value)} />
        <SelectField id={id("paper")} label="Paper" options={PAPER_OPTIONS} value={paper} onChange={(e) => setPaper(e.target.value)} />
        <div className="flex items-end">
          <Button type="submit" busy={flatten.isPending}>Flatten {seamMapVersion ? `seams v${seamMapVersion}` : "(no seams yet)"}</Button>
        </div>
        <div className="sm:col-span-2">
          <FormAlert message={problem ?? (flatten.isError ? errorMessage(flatten.error) : null)} />
        </div>
      </form>
      {jobId ? <JobProgress jobId={jobId} projectId={projectId} /> : null}
    </div>
  );
}
