import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { cache } from "react";
import { DownloadBar } from "@/components/results/download-bar";
import { PatternWaiting } from "@/components/results/pattern-waiting";
import { ResultsWorkspace } from "@/components/results/results-workspace";
import { ReviewPanel } from "@/components/results/review-panel";
import { WorkshopCautions } from "@/components/results/workshop-cautions";
import { PageHeading } from "@/components/studio/page-heading";
import { getStudioSession } from "@/components/studio/studio-session";
import { Panel } from "@/components/ui/panel";
import { isAppError } from "@/lib/errors/app-error";
import type { LengthUnit } from "@/lib/geometry/mesh";
import { findFoamMaterial, STRICTEST_STRETCH_LIMIT } from "@/lib/patterns/materials";
import { getPatternDto } from "@/lib/patterns-store/patterns";
import { can } from "@/lib/permissions/permissions";
import { findProject } from "@/lib/projects/projects";
import { getScanDto } from "@/lib/scans/scans";
import { patternParamsSchema } from "@/lib/validations/patterns";

type Params = Promise<{ id: string }>;

/**
 * The pattern at this address as the API would show it to this member (fabricators: approved ones only), with
 * its project and scan; null for unknown, malformed, other shops' or hidden patterns.
 */
const loadPattern = cache(async (rawId: string) => {
  const parsed = patternParamsSchema.safeParse({ id: rawId });
  if (!parsed.success) return null;
  const session = await getStudioSession();
  if (!session) return null;
  try {
    const pattern = await getPatternDto({ shopId: session.shop.id, role: session.role }, parsed.data.id);
    const [project, scan] = await Promise.all([findProject(session.shop.id, pattern.projectId), getScanDto(session.shop.id, pattern.scanId)]);
    return { session, pattern, project, scan };
  } catch (err) {
    if (isAppError(err) && err.code === "NOT_FOUND") return null;
    throw err;
  }
});

export async function generateMetadata({ params }: { params: Params }): Promise<Metadata> {
  const found = await loadPattern((await params).id);
  return { title: found ? `Pattern · ${found.project.name}` : "Pattern not found" };
}

export default async function PatternPage({ params }: { params: Params }) {
  const found = await loadPattern((await params).id);
  if (!found) {
    if (!(await getStudioSession())) return null;
    notFound();
  }
  const { session, pattern, project, scan } = found;
  const material = findFoamMaterial(pattern.params.material);
  const limit = material?.stretchLimit ?? STRICTEST_STRETCH_LIMIT;
  const report = pattern.report as { units?: LengthUnit; scale?: { percent: number }; warnings?: string[] } | null;
  const units: LengthUnit = report?.units ?? pattern.params.units ?? scan.units;
  const lead = [
    `${scan.name}`,
    pattern.seamMapVersion ? `seams v${pattern.seamMapVersion}` : "no seams",
    `${material?.name ?? pattern.params.material}, ${pattern.params.thicknessMm} mm`,
    report?.scale ? `${Math.round(report.scale.percent * 10) / 10} %` : null,
  ].filter(Boolean).join(" · ");

  return (
    <div className="flex flex-col gap-6">
      <div>
        <Link href={`/projects/${project.id}`} className="text-xs text-foam-800 underline">← {project.name}</Link>
        <PageHeading eyebrow="Pattern" title={`${project.name}: ${pattern.pieces.length} piece${pattern.pieces.length === 1 ? "" : "s"}`} lead={lead} />
      </div>

      {pattern.status === "queued" || pattern.status === "processing" ? (
        <Panel title="Being made">
          <PatternWaiting initial={pattern} />
        </Panel>
      ) : null}
      {pattern.status === "failed" ? (
        <Panel title="This pattern could not be made">
          <p role="alert" className="text-sm text-ember-700">{pattern.error ?? "The flattening failed."}</p>
        </Panel>
      ) : null}

      {pattern.status === "ready" ? (
        <>
          {report?.warnings?.length ? (
            <Panel title="Warnings">
              <ul className="flex list-disc flex-col gap-1 pl-5 text-sm text-ember-700">
                {report.warnings.map((w) => (
                  <li key={w}>{w}</li>
                ))}
              </ul>
            </Panel>
          ) : null}
          <ResultsWorkspace
            patternId={pattern.id}
            scanId={scan.id}
            meshUrl={scan.meshUrl}
            pieces={pattern.pieces}
            units={units}
            limit={limit}
            materialName={material?.name ?? pattern.params.material}
          />
          <div className="grid gap-6 lg:grid-cols-[3fr_2fr]">
            <Panel title="Downloads">
              <div className="flex flex-col gap-4">
                {can(session.role, "pattern:download") ? <DownloadBar patternId={pattern.id} /> : null}
                <WorkshopCautions />
              </div>
            </Panel>
            <ReviewPanel initial={pattern} canDecide={can(session.role, "review:decide")} />
          </div>
        </>
      ) : null}
    </div>
  );
}
