import { ROLE_LABELS, ROLES } from "@/lib/client/api-types";
import { can, type Action } from "@/lib/permissions/permissions";

/** The things the guide lists, read from the permission table so it never disagrees with the server. */
const ROWS: { action: Action; label: string }[] = [
  { action: "project:create", label: "Create and edit projects" },
  { action: "flatten:run", label: "Upload scans, draw seams, flatten" },
  { action: "review:decide", label: "Approve patterns or ask for changes" },
  { action: "pattern:download", label: "Download approved patterns" },
  { action: "member:manage", label: "Invite and manage members" },
];

/** A compact role × ability table for the members screen. */
export function RoleGuide() {
  return (
    <div className="-mx-5 overflow-x-auto">
      <table className="w-full min-w-[28rem] border-collapse text-xs">
        <caption className="sr-only">What each role can do</caption>
        <thead>
          <tr className="border-b border-kraft-200 text-left uppercase tracking-wider text-kraft-700">
            <th scope="col" className="px-5 py-2 font-bold">Ability</th>
            {ROLES.map((r) => (
              <th key={r} scope="col" className="px-2 py-2 text-center font-bold">
                {ROLE_LABELS[r]}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {ROWS.map((row) => (
            <tr key={row.action} className="border-b border-kraft-100 last:border-0">
              <th scope="row" className="px-5 py-2 text-left font-normal">
                {row.label}
              </th>
              {ROLES.map((r) => (
                <td key={r} className="px-2 py-2 text-center">
                  {can(r, row.action) ? (
                    <span className="font-bold text-foam-600">✓<span className="sr-only"> yes</span></span>
                  ) : (
                    <span className="text-kraft-500">–<span className="sr-only"> no</span></span>
                  )}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
