import { z } from "zod";
import { uuidField } from "@/lib/validations/fields";

/** POST /api/me/shop: make another of my shops the active one. */
export const switchShopSchema = z.strictObject({ shopId: uuidField("Shop") });
export type SwitchShopInput = z.infer<typeof switchShopSchema>;
