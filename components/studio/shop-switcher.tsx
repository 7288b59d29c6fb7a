"use client";

import { useRouter } from "next/navigation";
import { useId } from "react";
import { errorMessage } from "@/lib/client/api-fetch";
import type { MeResponse } from "@/lib/client/api-types";
import { useSwitchShop } from "@/lib/client/use-me";
import { useToast } from "@/components/toast/toast-provider";

/** The active shop's name as a select of all the user's shops; switching reloads the studio for the new shop. */
export function ShopSwitcher({ me }: { me: MeResponse }) {
  const id = useId();
  const router = useRouter();
  const toast = useToast();
  const switchShop = useSwitchShop();

  return (
    <div className="flex items-center gap-2">
      <label htmlFor={id} className="sr-only">
        Active shop
      </label>
      <select
        id={id}
        value={String(me.shop.id)}
        disabled={switchShop.isPending}
        onChange={(e) => {
          const shopId = e.target.value;
          const target = me.shops.find((s) => String(s.id) === shopId);
          switchShop.mutate(shopId, {
            onSuccess: () => {
              toast.success(`Switched to ${target?.name ?? "the shop"}.`);
              router.push("/projects");
              router.refresh();
            },
            onError: (err) => toast.error(errorMessage(err)),
          });
        }}
        className="max-w-[16rem] border border-foam-600 bg-foam-800 px-1 py-0.5 text-sm font-bold text-white hover:border-kraft-200 focus:outline-2 focus:outline-foam-400"
      >
        {me.shops.map((s) => (
          <option key={s.id} value={String(s.id)}>
            {s.name}
          </option>
        ))}
      </select>
    </div>
  );
}
