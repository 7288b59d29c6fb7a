"use client";

import { Button } from "@/components/ui/button";
import { Panel } from "@/components/ui/panel";

/** Studio error boundary: a plain message and a retry; the server log has the details. */
export default function StudioError({ reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <Panel title="Something went wrong">
      <div role="alert" className="flex flex-col items-start gap-3 text-sm">
        <p>This screen could not be loaded. Your work is saved; nothing was changed by this error.</p>
        <Button onClick={reset}>Try again</Button>
      </div>
    </Panel>
  );
}
