// POST /api/admin/notifications/digest: send the daily digest now to everyone who chose it (admins).
import { route } from "@/lib/api/handler";
import { sendDigestsNow } from "@/lib/notifications/digest";

export const POST = route("system.digest", async ({ actor }) => sendDigestsNow(actor));
