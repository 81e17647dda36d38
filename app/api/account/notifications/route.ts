// GET /api/account/notifications: how the caller wants review e-mails. PATCH: change it with the version read.
import { readJson, route } from "@/lib/api/handler";
import { getNotificationChoice, setNotificationChoice } from "@/lib/users/notification-choice";
import { notificationChoiceSchema } from "@/lib/users/schemas";

export const GET = route("account.notifications", async ({ actor }) => getNotificationChoice(actor));

export const PATCH = route("account.notifications", async ({ req, actor }) => setNotificationChoice(actor, await readJson(req, notificationChoiceSchema)));
