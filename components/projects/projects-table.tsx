"use client";

import Link from "next/link";
import { errorMessage } from "@/lib/client/api-fetch";
import type { Project } from "@/lib/client/api-types";
import { formatDay } from "@/lib/client/format";
import { useProjects } from "@/lib/client/use-projects";
import { StatusBadge } from "./status-badge";

/** Every project of the active shop, in the order the API gives (soonest due first). */
export function ProjectsTable({ initial }: { initial?: Project[] }) {
  const query = useProjects(initial);

  if (query.isPending) {
    return <p className="py-6 text-sm text-kraft-700" role="status">Loading projects…</p>;
  }
  if (query.isError) {
    return (
      <p role="alert" className="py-6 text-sm text-ember-700">
        Could not load projects: {errorMessage(query.error)}
      </p>
    );
  }
  // Kept in the API's order: soonest due first, undated last, then newest.
  const projects = query.data;
  if (projects.length === 0) {
    return (
      <div className="flex flex-col items-start gap-1 py-6">
        <p className="text-sm font-bold">No projects yet.</p>
        <p className="text-sm text-kraft-700">A project holds one build: its client, due date, notes and status.</p>
      </div>
    );
  }

  return (
    <div className="-mx-5 overflow-x-auto">
      <table className="w-full min-w-[40rem] border-collapse text-sm">
        <caption className="sr-only">Projects of this shop</caption>
        <thead>
          <tr className="border-b border-kraft-200 text-left text-xs uppercase tracking-wider text-kraft-700">
            <th scope="col" className="px-5 py-2 font-bold">Project</th>
            <th scope="col" className="px-3 py-2 font-bold">Client</th>
            <th scope="col" className="px-3 py-2 font-bold">Status</th>
            <th scope="col" className="px-3 py-2 font-bold">Due</th>
            <th scope="col" className="px-5 py-2 text-right font-bold">Updated</th>
          </tr>
        </thead>
        <tbody>
          {projects.map((p) => (
            <tr key={p.id} className="border-b border-kraft-100 last:border-0 hover:bg-kraft-50">
              <th scope="row" className="px-5 py-3 text-left font-medium">
                <Link href={`/projects/${p.id}`} className="text-foam-800 underline-offset-2 hover:underline">
                  {p.name}
                </Link>
              </th>
              <td className="px-3 py-3 text-kraft-700">{p.client || "—"}</td>
              <td className="px-3 py-3">
                <StatusBadge status={p.status} />
              </td>
              <td className="px-3 py-3 whitespace-nowrap">{formatDay(p.dueDate)}</td>
              <td className="px-5 py-3 text-right whitespace-nowrap text-kraft-700">{formatDay(p.updatedAt)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
