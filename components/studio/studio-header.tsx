"use client";

import Link from "next/link";
import { usePathname } from "next/navigation";
import { PeelMark } from "@/components/brand/wordmark";
import { ROLE_LABELS, type MeResponse } from "@/lib/client/api-types";
import { useMe } from "@/lib/client/use-me";
import { can } from "@/lib/permissions/permissions";
import { ShopSwitcher } from "./shop-switcher";
import { SignOutButton } from "./sign-out-button";

/** Top bar of the studio: mark, sections the role may open, the active shop and role, shop switcher, sign-out. */
export function StudioHeader({ initialMe }: { initialMe?: MeResponse }) {
  const me = useMe(initialMe);
  const pathname = usePathname();
  const role = me.data?.role;

  const links = [
    { href: "/projects", label: "Projects", show: true },
    { href: "/members", label: "Members", show: role ? can(role, "member:read") : false },
  ];

  return (
    <header className="bg-foam-800 text-white">
      <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-6 gap-y-3 px-4 py-3 sm:px-6">
        <Link href="/projects" className="inline-flex items-center gap-2 text-lg font-bold tracking-tight text-white">
          <PeelMark className="h-7 w-7 text-kraft-100" />
          <span>peelform</span>
        </Link>

        <nav aria-label="Studio" className="flex items-center gap-1">
          {links
            .filter((l) => l.show)
            .map((l) => {
              const active = pathname === l.href || pathname.startsWith(`${l.href}/`);
              return (
                <Link
                  key={l.href}
                  href={l.href}
                  aria-current={active ? "page" : undefined}
                  className={`px-3 py-1.5 text-sm ${active ? "bg-kraft-100 font-bold text-foam-800" : "text-kraft-100 hover:bg-foam-600"}`}
                >
                  {l.label}
                </Link>
              );
            })}
        </nav>

        <div className="ml-auto flex flex-wrap items-center gap-3">
          {me.data ? (
            <div
              className="flex flex-col items-end gap-0.5 leading-tight"
              data-testid="shop-identity"
              data-shop-name={me.data.shop.name}
              data-role={me.data.role}
            >
              {me.data.shops.length > 1 ? (
                <ShopSwitcher me={me.data} />
              ) : (
                <span className="text-sm font-bold">{me.data.shop.name}</span>
              )}
              <span className="text-xs text-kraft-200">
                {me.data.user.name} · <span data-testid="user-role">{ROLE_LABELS[me.data.role] ?? me.data.role}</span>
              </span>
            </div>
          ) : null}
          <SignOutButton />
        </div>
      </div>
    </header>
  );
}
