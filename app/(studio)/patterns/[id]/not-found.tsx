import Link from "next/link";
import { buttonClass } from "@/components/ui/button-styles";
import { Panel } from "@/components/ui/panel";

/** A pattern id that does not exist, belongs to another shop, or is not approved yet (fabricators): all look the same. */
export default function PatternNotFound() {
  return (
    <Panel title="Pattern not found">
      <div className="flex flex-col items-start gap-3 text-sm">
        <p className="font-bold text-foam-800">This pattern is not available to you.</p>
        <p className="text-kraft-700">It may have been deleted, belong to another shop, or still be waiting for approval.</p>
        <Link href="/projects" className={buttonClass("secondary")}>
          All projects
        </Link>
      </div>
    </Panel>
  );
}
