"use client";

import { useRef, useState } from "react";
import { Button } from "@/components/ui/button";
import { FormAlert } from "@/components/ui/form-alert";
import { SelectField } from "@/components/ui/field";
import { errorMessage } from "@/lib/client/api-fetch";
import { LENGTH_UNITS } from "@/lib/geometry/mesh";
import { useUploadScan } from "./use-scan-queries";

const UNIT_OPTIONS = LENGTH_UNITS.map((u) => ({ value: u, label: { mm: "millimetres (mm)", cm: "centimetres (cm)", m: "metres (m)", in: "inches (in)" }[u] }));

/** Upload an OBJ or STL with the units its coordinates are in (files carry none). */
export function ScanUploadForm({ projectId }: { projectId: string }) {
  const upload = useUploadScan(projectId);
  const fileRef = useRef<HTMLInputElement>(null);
  const [units, setUnits] = useState("mm");
  const [missing, setMissing] = useState(false);

  return (
    <form
      className="flex flex-col gap-3"
      onSubmit={(e) => {
        e.preventDefault();
        const file = fileRef.current?.files?.[0];
        setMissing(!file);
        if (!file) return;
        upload.mutate({ file, units }, { onSuccess: () => fileRef.current && (fileRef.current.value = "") });
      }}
    >
      <div className="flex flex-col gap-1">
        <label htmlFor="scan-file" className="text-xs font-bold uppercase tracking-wider text-kraft-700">Mesh file (OBJ or STL)</label>
        <input id="scan-file" ref={fileRef} type="file" accept=".obj,.stl,model/obj,model/stl" className="text-sm" aria-invalid={missing || undefined} />
        {missing ? <p className="text-xs font-medium text-ember-700">Choose a file to upload.</p> : null}
      </div>
      <SelectField id="scan-units" label="Units of the file" options={UNIT_OPTIONS} value={units} onChange={(e) => setUnits(e.target.value)} />
      <FormAlert message={upload.isError ? errorMessage(upload.error) : null} />
      <div>
        <Button type="submit" busy={upload.isPending}>Upload scan</Button>
      </div>
    </form>
  );
}
