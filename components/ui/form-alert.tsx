/** A message above a form's submit button (e.g. wrong password); announced to screen readers. */
export function FormAlert({ message, tone = "error" }: { message: string | null | undefined; tone?: "error" | "success" }) {
  if (!message) return null;
  return (
    <p
      role={tone === "error" ? "alert" : "status"}
      className={`border-l-4 px-3 py-2 text-sm ${
        tone === "error" ? "border-ember-700 bg-ember-500/10 text-ember-700" : "border-foam-600 bg-foam-400/10 text-foam-800"
      }`}
    >
      {message}
    </p>
  );
}
