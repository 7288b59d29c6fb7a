"use client";

import { createContext, useCallback, useContext, useEffect, useMemo, useRef, useState, type ReactNode } from "react";

/** Tone of a toast: `success` confirms an action, `error` reports a failure (announced assertively). */
export type ToastTone = "success" | "error" | "info";

interface ToastItem {
  id: number;
  tone: ToastTone;
  message: string;
}

interface ToastApi {
  show: (message: string, tone?: ToastTone) => void;
  success: (message: string) => void;
  error: (message: string) => void;
}

const ToastContext = createContext<ToastApi | null>(null);

const LIFETIME_MS = 5000;

/** Holds the toast stack for the whole app and renders it in a live region (bottom right). */
export function ToastProvider({ children }: { children: ReactNode }) {
  const [items, setItems] = useState<ToastItem[]>([]);
  const nextId = useRef(1);

  const dismiss = useCallback((id: number) => setItems((list) => list.filter((t) => t.id !== id)), []);

  const show = useCallback((message: string, tone: ToastTone = "info") => {
    const id = nextId.current++;
    setItems((list) => [...list.slice(-3), { id, tone, message }]);
  }, []);

  const api = useMemo<ToastApi>(
    () => ({ show, success: (m) => show(m, "success"), error: (m) => show(m, "error") }),
    [show],
  );

  return (
    <ToastContext.Provider value={api}>
      {children}
      <div className="pointer-events-none fixed bottom-4 right-4 z-50 flex w-[min(24rem,calc(100vw-2rem))] flex-col gap-2">
        <div role="status" aria-live="polite" className="flex flex-col gap-2">
          {items.filter((t) => t.tone !== "error").map((t) => (
            <Toast key={t.id} item={t} onDismiss={dismiss} />
          ))}
        </div>
        <div role="alert" aria-live="assertive" className="flex flex-col gap-2">
          {items.filter((t) => t.tone === "error").map((t) => (
            <Toast key={t.id} item={t} onDismiss={dismiss} />
          ))}
        </div>
      </div>
    </ToastContext.Provider>
  );
}

const toneClass: Record<ToastTone, string> = {
  success: "border-foam-600 bg-white",
  error: "border-ember-700 bg-white",
  info: "border-kraft-500 bg-white",
};

const toneMark: Record<ToastTone, string> = { success: "✓", error: "!", info: "i" };

function Toast({ item, onDismiss }: { item: ToastItem; onDismiss: (id: number) => void }) {
  useEffect(() => {
    const timer = setTimeout(() => onDismiss(item.id), LIFETIME_MS);
    return () => clearTimeout(timer);
  }, [item.id, onDismiss]);

  return (
    <div
      data-toast={item.tone}
      className={`pointer-events-auto flex items-start gap-3 border-l-4 px-4 py-3 text-sm shadow-[4px_4px_0_0_rgba(58,42,18,0.15)] ${toneClass[item.tone]}`}
    >
      <span
        aria-hidden="true"
        className={`mt-0.5 flex h-5 w-5 flex-none items-center justify-center text-xs font-bold text-white ${
          item.tone === "error" ? "bg-ember-700" : item.tone === "success" ? "bg-foam-600" : "bg-kraft-500"
        }`}
      >
        {toneMark[item.tone]}
      </span>
      <p className="flex-1 break-words">{item.message}</p>
      <button
        type="button"
        onClick={() => onDismiss(item.id)}
        className="-m-1 p-1 text-kraft-700 hover:text-kraft-900"
        aria-label="Dismiss notification"
      >
        ×
      </button>
    </div>
  );
}

/** Access the toast stack from any client component below the root layout. */
export function useToast(): ToastApi {
  const api = useContext(ToastContext);
  if (!api) throw new Error("useToast must be used inside <ToastProvider>");
  return api;
}
