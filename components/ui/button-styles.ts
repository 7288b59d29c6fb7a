/** Shared class strings so links and buttons look the same. */
export type ButtonVariant = "primary" | "secondary" | "danger" | "ghost";

const base =
  "inline-flex items-center justify-center gap-2 px-4 py-2 text-sm font-medium tracking-tight transition-colors " +
  "disabled:cursor-not-allowed disabled:opacity-50 focus-visible:outline-2 focus-visible:outline-offset-2";

const variants: Record<ButtonVariant, string> = {
  primary: "bg-foam-800 text-white hover:bg-foam-600 focus-visible:outline-foam-600 shadow-[3px_3px_0_0_#b08947]",
  secondary: "border border-kraft-500 bg-white text-kraft-900 hover:bg-kraft-100 focus-visible:outline-foam-600",
  danger: "bg-ember-700 text-white hover:bg-ember-500 focus-visible:outline-ember-700",
  ghost: "text-kraft-900 hover:bg-kraft-100 focus-visible:outline-foam-600",
};

export function buttonClass(variant: ButtonVariant = "primary", extra = ""): string {
  return `${base} ${variants[variant]} ${extra}`.trim();
}
