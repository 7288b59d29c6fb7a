import Link from "next/link";
import type { ComponentProps } from "react";

/** An inline link in our teal with a visible underline (not colour alone). */
export function TextLink({ className = "", ...rest }: ComponentProps<typeof Link>) {
  return <Link className={`font-medium text-foam-600 underline underline-offset-2 hover:text-foam-800 ${className}`} {...rest} />;
}
