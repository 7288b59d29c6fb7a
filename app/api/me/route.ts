import { route } from "@/lib/api/route-handler";
import { describeMe } from "@/lib/accounts/me";

export const GET = route({}, async ({ session }) => describeMe(session));
