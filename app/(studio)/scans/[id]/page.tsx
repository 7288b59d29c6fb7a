import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { cache } from "react";
import { ScanStudio } from "@/components/seams/scan-studio";
import type { SeamVersion } from "@/components/seams/versions-panel";
import { PageHeading } from "@/components/studio/page-heading";
import { getStudioSession } from "@/components/studio/studio-session";
import { Panel } from "@/components/ui/panel";
import { getSequelize } from "@/lib/db/sequelize";
import { isAppError } from "@/lib/errors/app-error";
import { can } from "@/lib/permissions/permissions";
import { findProject } from "@/lib/projects/projects";
import { getScanDto } from "@/lib/scans/scans";
import { scanParamsSchema } from "@/lib/validations/scans";
import { SeamMap } from "@/models";

type Params = Promise<{ id: string }>;

/** The scan of the active shop at this address with its project name, or null (unknown, malformed or foreign id). */
const loadScan = cache(async (rawId: string) => {
  const parsed = scanParamsSchema.safeParse({ id: rawId });
  if (!parsed.success) return null;
  const session = await getStudioSession();
  if (!session) return null;
  try {
    const scan = await getScanDto(session.shop.id, parsed.data.id);
    const project = await findProject(session.shop.id, scan.projectId);
    return { session, scan, projectName: project.name };
  } catch (err) {
    if (isAppError(err) && err.code === "NOT_FOUND") return null;
    throw err;
  }
});

/** Every saved seam-map version of the scan, newest first (the seam API answers only the latest). */
async function loadVersions(scanId: string): Promise<SeamVersion[]> {
  getSequelize();
  const rows = await SeamMap.findAll({ where: { scanId }, order: [["version", "DESC"]], attributes: ["version", "createdAt", "edgeCount", "seams"] });
  return rows.map((r) => ({ version: r.version, createdAt: r.createdAt.toISOString(), edgeCount: r.edgeCount, seams: r.seams }));
}

export async function generateMetadata({ params }: { params: Params }): Promise<Metadata> {
  const found = await loadScan((await params).id);
  return { title: found ? found.scan.name : "Scan not found" };
}

export default async function ScanPage({ params }: { params: Params }) {
  const found = await loadScan((await params).id);
  if (!found) {
    if (!(await getStudioSession())) return null;
    notFound();
  }
  const { session, scan, projectName } = found;
  const canEdit = can(session.role, "seams:edit");
  const canFlatten = can(session.role, "flatten:run");
  const back = (
    <Link href={`/projects/${scan.projectId}`} className="text-sm font-bold text-foam-800 underline underline-offset-2 focus-visible:outline-2 focus-visible:outline-foam-600">
      ← {projectName}
    </Link>
  );
  const counts = scan.faceCount !== null ? `${scan.faceCount.toLocaleString("en-US")} faces · ${scan.units}` : scan.units;

  if (scan.status !== "ready") {
    return (
      <>
        <PageHeading eyebrow="Scan" title={scan.name} lead={counts} actions={back} />
        <Panel title={scan.status === "failed" ? "This scan could not be read" : "Still reading the scan"}>
          <p className="text-sm text-kraft-900" role={scan.status === "failed" ? "alert" : "status"}>
            {scan.status === "failed" ? scan.error ?? "The file could not be read." : "The worker is welding and checking the mesh. Reload this page in a moment."}
          </p>
        </Panel>
      </>
    );
  }

  return (
    <>
      <PageHeading
        eyebrow={canEdit ? "Seam studio" : "Scan (read only)"}
        title={scan.name}
        lead={counts}
        actions={back}
      />
      <ScanStudio
        scan={{ id: scan.id, projectId: scan.projectId, name: scan.name, units: scan.units, faceCount: scan.faceCount }}
        canEdit={canEdit}
        canFlatten={canFlatten}
        versions={canEdit || can(session.role, "project:read") ? await loadVersions(scan.id) : []}
      />
    </>
  );
}
