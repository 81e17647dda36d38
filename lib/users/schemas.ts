import { z } from "zod";
import { NOTIFY_MODES, ROLES } from "@/db/schema/users";

export const roleSchema = z.enum(ROLES);
export const emailSchema = z.string().trim().toLowerCase().email("Enter a valid e-mail address.").max(254);
export const personNameSchema = z.string().trim().min(1, "Enter a name.").max(120, "Use at most 120 characters.");

export const USER_SORTS = ["name", "email", "role", "createdAt", "lastSignInAt"] as const;

export const userListQuerySchema = z.object({
  q: z.string().trim().max(100).optional(),
  role: roleSchema.optional(),
  status: z.enum(["active", "disabled"]).optional(),
  sort: z.enum(USER_SORTS).default("name"),
  dir: z.enum(["asc", "desc"]).default("asc"),
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(5).max(100).default(20),
});
export type UserListQuery = z.infer<typeof userListQuerySchema>;

export const userUpdateSchema = z
  .object({
    version: z.number().int().positive(),
    role: roleSchema.optional(),
    disabled: z.boolean().optional(),
  })
  .refine((v) => v.role !== undefined || v.disabled !== undefined, "Say what to change: role or disabled.");
export type UserUpdate = z.infer<typeof userUpdateSchema>;

export const invitationSchema = z.object({ email: emailSchema, role: roleSchema });
export type InvitationInput = z.infer<typeof invitationSchema>;

/** How a person wants review e-mails; the same schema parses the account form and the API. */
export const notificationChoiceSchema = z.object({
  version: z.number().int().positive(),
  notify: z.enum(NOTIFY_MODES, { error: "Choose each at once, one letter a day, or none." }),
});
export type NotificationChoiceInput = z.infer<typeof notificationChoiceSchema>;
