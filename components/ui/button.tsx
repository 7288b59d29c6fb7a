import type { ButtonHTMLAttributes, Ref } from "react";
import { buttonClass, type ButtonVariant } from "./button-styles";

interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: ButtonVariant;
  busy?: boolean;
  ref?: Ref<HTMLButtonElement>;
}

/** A button; `busy` disables it and tells assistive tech that work is in progress. */
export function Button({ variant = "primary", busy = false, className = "", disabled, children, type, ...rest }: ButtonProps) {
  return (
    <button
      type={type ?? "button"}
      className={buttonClass(variant, className)}
      disabled={disabled || busy}
      aria-busy={busy || undefined}
      {...rest}
    >
      {busy ? <span aria-hidden="true" className="inline-block h-3 w-3 animate-spin border-2 border-current border-t-transparent" /> : null}
      {children}
    </button>
  );
}
