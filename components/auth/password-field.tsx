"use client";

import { useState, type InputHTMLAttributes, type Ref } from "react";
import { TextField } from "@/components/ui/field";

interface PasswordFieldProps extends Omit<InputHTMLAttributes<HTMLInputElement>, "type"> {
  id: string;
  label: string;
  hint?: string;
  error?: string;
  ref?: Ref<HTMLInputElement>;
}

/** A password input with a show/hide toggle (a real button, reachable by keyboard). */
export function PasswordField(props: PasswordFieldProps) {
  const [visible, setVisible] = useState(false);
  return (
    <div className="relative">
      <TextField {...props} type={visible ? "text" : "password"} className="pr-16" />
      <button
        type="button"
        onClick={() => setVisible((v) => !v)}
        aria-pressed={visible}
        aria-controls={props.id}
        className="absolute right-1 top-[1.6rem] px-2 py-1 text-xs text-foam-600 hover:text-foam-800"
      >
        {visible ? "Hide" : "Show"}
      </button>
    </div>
  );
}
