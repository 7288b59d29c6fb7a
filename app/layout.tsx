import type { Metadata, Viewport } from "next";
import type { ReactNode } from "react";
import "@fontsource/jetbrains-mono/400.css";
import "@fontsource/jetbrains-mono/500.css";
import "@fontsource/jetbrains-mono/700.css";
import "./globals.css";
import { ToastProvider } from "@/components/toast/toast-provider";

export const metadata: Metadata = {
  title: { default: "Peelform", template: "%s · Peelform" },
  description: "From a sculpt or a 3D scan to true-scale foam patterns for your shop.",
};

export const viewport: Viewport = { width: "device-width", initialScale: 1, themeColor: "#11463f" };

export default function RootLayout({ children }: { children: ReactNode }) {
  return (
    <html lang="en">
      <body className="font-mono text-kraft-900">
        <ToastProvider>{children}</ToastProvider>
      </body>
    </html>
  );
}
