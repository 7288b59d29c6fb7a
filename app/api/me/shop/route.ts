import { route } from "@/lib/api/route-handler";
import { json } from "@/lib/api/responses";
import { describeMe, switchActiveShop } from "@/lib/accounts/me";
import { switchShopSchema } from "@/lib/validations/me";

/** Switches the active shop: re-issues the session cookie and answers the new GET /api/me body. */
export const POST = route({ body: switchShopSchema }, async ({ session, body }) => {
  const { setCookie, session: next } = await switchActiveShop(session, body.shopId);
  return json(await describeMe(next), { headers: { "set-cookie": setCookie } });
});
