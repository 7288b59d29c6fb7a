"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { Controller, useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { FormAlert } from "@/components/ui/form-alert";
import { SelectField, TextField } from "@/components/ui/field";
import { errorMessage } from "@/lib/client/api-fetch";
import { useQueueFlatten } from "@/lib/client/scans/use-flatten-job";
import { LENGTH_UNITS, type LengthUnit } from "@/lib/geometry/mesh";
import { FOAM_MATERIALS } from "@/lib/patterns/materials";
import { PAPER_IDS, PAPER_SIZES } from "@/lib/patterns/paper-sizes";
import { DEFAULT_OVERLAP_MM } from "@/lib/patterns/pattern-input";
import { flattenParamsSchema, type FlattenParams, type FlattenParamsInput } from "@/lib/validations/flatten";
import { JobBar } from "./job-bar";

const MATERIAL_OPTIONS = FOAM_MATERIALS.map((m) => ({ value: m.id, label: `${m.name} (≤ ${Math.round(m.stretchLimit * 100)} % stretch)` }));
const PAPER_OPTIONS = PAPER_IDS.map((p) => ({ value: p, label: p === "full" ? "Full size (one sheet)" : PAPER_SIZES[p].name }));
const UNIT_OPTIONS = LENGTH_UNITS.map((u) => ({ value: u, label: u }));
const AXIS_OPTIONS = [
  { value: "x", label: "Width (X)" }, { value: "y", label: "Height (Y)" }, { value: "z", label: "Depth (Z)" }, { value: "largest", label: "Largest side" },
];
const FACE_OPTIONS = [
  { value: "outer", label: "Outside (a shell over a form)" },
  { value: "inner", label: "Inside (a lining)" },
];

/**
 * Flatten parameters, checked with the API's own schema (lib/validations/flatten.ts) through zodResolver, then
 * POST /api/scans/[id]/flatten and the job's progress. Size is either a scale in percent or a target size along an
 * axis with its unit.
 */
export function FlattenPanel({ scanId, units, savedVersion, unsaved }: { scanId: string; units: LengthUnit; savedVersion: number | null; unsaved: boolean }) {
  const queue = useQueueFlatten(scanId);
  const [job, setJob] = useState<{ jobId: string; patternId: string } | null>(null);
  const [sizing, setSizing] = useState<"percent" | "target">("percent");
  const [targetNumber, setTargetNumber] = useState("");
  const [targetUnit, setTargetUnit] = useState<LengthUnit>(units);
  const form = useForm<FlattenParamsInput, unknown, FlattenParams>({
    resolver: zodResolver(flattenParamsSchema),
    defaultValues: { material: "eva", thicknessMm: 6, scanFace: "outer", units, scale: 1, targetAxis: "x", paper: "letter", overlapMm: DEFAULT_OVERLAP_MM, tickSpacingMm: 50, mirror: null },
  });
  const { register, handleSubmit, control, setValue, formState: { errors } } = form;
  const id = (n: string) => `flatten-${n}`;

  const chooseSizing = (mode: "percent" | "target") => {
    setSizing(mode);
    if (mode === "percent") { setValue("targetWidth", undefined); setValue("scale", 1); }
    else { setValue("scale", undefined); setValue("targetWidth", targetNumber ? `${targetNumber}${targetUnit}` : ""); }
  };
  const setTarget = (n: string, u: LengthUnit) => {
    setTargetNumber(n);
    setTargetUnit(u);
    setValue("targetWidth", n.trim() ? `${n.trim()}${u}` : "", { shouldValidate: form.formState.isSubmitted });
  };

  const onSubmit = handleSubmit((values) => {
    const body: FlattenParamsInput = { ...values, ...(savedVersion ? { seamMapVersion: savedVersion } : {}) };
    queue.mutate(body, { onSuccess: (r) => setJob(r) });
  });

  return (
    <div className="flex flex-col gap-4">
      <p className="text-xs text-kraft-700">
        {savedVersion ? `Uses the saved seams, version ${savedVersion}.` : "No seams saved yet: the scan is flattened as it is."}
        {unsaved ? <strong className="text-ember-700"> Seams on screen are not saved; save them first to flatten them.</strong> : null}
      </p>
      <form className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4" onSubmit={onSubmit} noValidate aria-label="Flatten parameters">
        <SelectField id={id("material")} label="Foam" options={MATERIAL_OPTIONS} error={errors.material?.message} {...register("material")} />
        <TextField id={id("thickness")} label="Thickness (mm)" type="number" step="0.5" inputMode="decimal" error={errors.thicknessMm?.message} {...register("thicknessMm", { valueAsNumber: true })} />
        <SelectField id={id("face")} label="The scan is the" options={FACE_OPTIONS} error={errors.scanFace?.message} {...register("scanFace")} />
        <SelectField id={id("units")} label="Pattern units" options={UNIT_OPTIONS} error={errors.units?.message} {...register("units")} />
        <fieldset className="flex flex-col gap-2 sm:col-span-2">
          <legend className="text-xs font-bold uppercase tracking-wider text-kraft-700">Build size</legend>
          <div className="flex gap-4 text-sm">
            <label className="flex items-center gap-1"><input type="radio" name="sizing" checked={sizing === "percent"} onChange={() => chooseSizing("percent")} className="accent-foam-600" />Scale by %</label>
            <label className="flex items-center gap-1"><input type="radio" name="sizing" checked={sizing === "target"} onChange={() => chooseSizing("target")} className="accent-foam-600" />Target size</label>
          </div>
          {sizing === "percent" ? (
            <Controller
              control={control}
              name="scale"
              render={({ field }) => (
                <TextField
                  id={id("percent")}
                  label="Scale (%): build ÷ scan × 100"
                  type="number"
                  step="any"
                  inputMode="decimal"
                  value={field.value === undefined ? "" : String(Math.round(field.value * 100000) / 1000)}
                  onChange={(e) => field.onChange(e.target.value === "" ? Number.NaN : Number(e.target.value) / 100)}
                  onBlur={field.onBlur}
                  error={errors.scale?.message}
                />
              )}
            />
          ) : (
            <div className="grid grid-cols-[1fr_auto_auto] items-end gap-2">
              <TextField id={id("target")} label="Target size" type="number" step="any" inputMode="decimal" value={targetNumber} onChange={(e) => setTarget(e.target.value, targetUnit)} error={errors.targetWidth?.message} />
              <SelectField id={id("target-unit")} label="Unit" options={UNIT_OPTIONS} value={targetUnit} onChange={(e) => setTarget(targetNumber, e.target.value as LengthUnit)} />
              <SelectField id={id("axis")} label="Along" options={AXIS_OPTIONS} {...register("targetAxis")} />
            </div>
          )}
        </fieldset>
        <SelectField id={id("paper")} label="Paper" options={PAPER_OPTIONS} error={errors.paper?.message} {...register("paper")} />
        <TextField id={id("overlap")} label="Tile overlap (mm)" type="number" step="1" inputMode="decimal" error={errors.overlapMm?.message} {...register("overlapMm", { valueAsNumber: true })} />
        <TextField id={id("ticks")} label="Registration marks every (mm)" type="number" step="5" inputMode="decimal" error={errors.tickSpacingMm?.message} {...register("tickSpacingMm", { valueAsNumber: true })} />
        <div className="flex items-end">
          <Button type="submit" busy={queue.isPending} data-testid="flatten-submit">Flatten{savedVersion ? ` v${savedVersion}` : ""}</Button>
        </div>
      </form>
      <FormAlert message={queue.isError ? errorMessage(queue.error) : null} />
      {job ? <JobBar key={job.jobId} jobId={job.jobId} patternId={job.patternId} /> : null}
    </div>
  );
}
