import { STATUS_LABELS, type ProjectStatus } from "@/lib/client/api-types";

const statusClass: Record<ProjectStatus, string> = {
  planning: "border-kraft-500 text-kraft-700 bg-kraft-50",
  patterning: "border-foam-600 text-foam-800 bg-foam-400/10",
  in_review: "border-ember-500 text-ember-700 bg-ember-500/10",
  approved: "border-foam-800 text-white bg-foam-800",
  building: "border-kraft-700 text-white bg-kraft-700",
  delivered: "border-kraft-900 text-kraft-900 bg-white",
};

/** Status as a small outlined tag; the text carries the meaning, colour only supports it. */
export function StatusBadge({ status }: { status: ProjectStatus }) {
  return (
    <span className={`inline-block border px-2 py-0.5 text-xs font-medium ${statusClass[status] ?? statusClass.planning}`}>
      {STATUS_LABELS[status] ?? status}
    </span>
  );
}
