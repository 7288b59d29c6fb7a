import Link from "next/link";
import { buttonClass } from "@/components/ui/button-styles";
import { Panel } from "@/components/ui/panel";

/** A scan id that does not exist, was deleted, or belongs to another shop: all look the same. */
export default function ScanNotFound() {
  return (
    <Panel title="Scan not found">
      <div className="flex flex-col items-start gap-3 text-sm">
        <p className="font-bold text-foam-800">This scan is not in your shop.</p>
        <p className="text-kraft-700">It may have been deleted, or the link belongs to another shop.</p>
        <Link href="/projects" className={buttonClass("secondary")}>
          All projects
        </Link>
      </div>
    </Panel>
  );
}
