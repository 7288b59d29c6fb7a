import { getEnv } from "@/lib/env";
import { SAFETY_REMINDER } from "@/lib/safety/cautions";
import type { MailJob } from "@/lib/queue/mail-queue";

/** Link to a pattern's page in the app. */
export function patternLink(patternId: string): string {
  return `${getEnv().APP_URL.replace(/\/+$/, "")}/patterns/${patternId}`;
}

/** The notice to the person who queued a flatten, when it finished or failed. */
export function patternNotice(opts: {
  to: string;
  name: string;
  patternId: string;
  projectName: string;
  scanName: string;
  outcome: { ok: true; pieces: number; notFlat: number; warnings: number } | { ok: false; error: string };
}): MailJob {
  const link = patternLink(opts.patternId);
  const what = `${opts.projectName} (${opts.scanName})`;
  if (opts.outcome.ok) {
    const o = opts.outcome;
    const notes = [
      `${o.pieces} piece${o.pieces === 1 ? "" : "s"}`,
      o.notFlat > 0 ? `${o.notFlat} could not be flattened and need${o.notFlat === 1 ? "s" : ""} another seam` : null,
      o.warnings > 0 ? `${o.warnings} warning${o.warnings === 1 ? "" : "s"} to read` : null,
    ].filter(Boolean).join(", ");
    return {
      to: opts.to,
      subject: `Pattern ready: ${opts.projectName}`.slice(0, 200),
      text: `Hello ${opts.name},\n\nThe pattern for ${what} is ready: ${notes}.\n\nOpen it, check the stretch report and download the PDF:\n${link}\n\n${SAFETY_REMINDER}\n`,
    };
  }
  return {
    to: opts.to,
    subject: `Pattern failed: ${opts.projectName}`.slice(0, 200),
    text: `Hello ${opts.name},\n\nThe pattern for ${what} could not be made:\n${opts.outcome.error}\n\nDetails:\n${link}\n`,
  };
}
