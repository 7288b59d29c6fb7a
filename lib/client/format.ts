/** Display helpers shared by the studio screens (pure, no React). */

const dateFmt = new Intl.DateTimeFormat("en-GB", { day: "2-digit", month: "short", year: "numeric", timeZone: "UTC" });
const dateTimeFmt = new Intl.DateTimeFormat("en-GB", {
  day: "2-digit",
  month: "short",
  year: "numeric",
  hour: "2-digit",
  minute: "2-digit",
  timeZone: "UTC",
});

/** "2026-12-24" → "24 Dec 2026"; `null` → "—". Calendar dates are read as UTC so they never shift a day. */
export function formatDay(value: string | null | undefined): string {
  if (!value) return "—";
  const d = new Date(value.length === 10 ? `${value}T00:00:00Z` : value);
  return Number.isNaN(d.getTime()) ? value : dateFmt.format(d).replace("Sept", "Sep");
}

/** An ISO timestamp as "24 Dec 2026, 14:05 UTC". */
export function formatTimestamp(value: string | null | undefined): string {
  if (!value) return "—";
  const d = new Date(value);
  return Number.isNaN(d.getTime()) ? value : `${dateTimeFmt.format(d).replace("Sept", "Sep")} UTC`;
}
