import { PatternsPanel } from "@/components/patterns/patterns-panel";
import { ScansPanel } from "./scans-panel";

/** Scans and patterns of a project page, controls shown per role (the API checks again). */
export function ProjectScansSection({ projectId, canUpload, canFlatten }: { projectId: string; canUpload: boolean; canFlatten: boolean }) {
  return (
    <div className="mt-6 grid gap-6 lg:grid-cols-2">
      <ScansPanel projectId={projectId} canUpload={canUpload} canFlatten={canFlatten} />
      <PatternsPanel projectId={projectId} />
    </div>
  );
}
