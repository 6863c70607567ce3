import { z } from "zod";
import { ROLES } from "@/lib/auth/permissions";

const email = z.string().trim().toLowerCase().min(1, "Enter an e-mail address.").max(254).email("Enter a valid e-mail address.");
const role = z.enum(ROLES, { message: `Choose a role: ${ROLES.join(", ")}.` });

export const inviteSchema = z.object({
  email,
  name: z.string().trim().min(1, "Enter the person's name.").max(120, "Keep the name under 120 characters."),
  role,
});

export const changePersonSchema = z
  .object({ role: role.optional(), active: z.boolean({ message: "active is true or false." }).optional() })
  .refine((v) => v.role !== undefined || v.active !== undefined, "Send a role, active, or both.");

export const tokenPasswordSchema = z.object({
  token: z.string().min(20, "This link is incomplete. Open the whole link from the e-mail.").max(100),
  password: z.string().min(1, "Choose a password.").max(500),
});

export const forgotSchema = z.object({ email });

export const noticesSchema = z
  .object({ digest: z.boolean().optional(), retrainAlerts: z.boolean().optional(), scanReceipts: z.boolean().optional() })
  .refine((v) => Object.values(v).some((x) => x !== undefined), "Send digest, retrainAlerts or scanReceipts (true or false).");

// An address (name@office.example) or a whole domain (office.example, or @office.example).
export const senderSchema = z.object({
  pattern: z
    .string()
    .trim()
    .toLowerCase()
    .transform((s) => s.replace(/^@/, ""))
    .pipe(
      z
        .string()
        .max(254)
        .regex(/^([^@\s]+@)?[a-z0-9]([a-z0-9-]*[a-z0-9])?(\.[a-z0-9]([a-z0-9-]*[a-z0-9])?)+$/, "Enter an address (copier@office.example) or a domain (office.example)."),
    ),
  filesAsUserId: z.coerce.number().int().positive("Choose the person the scans are filed as."),
  note: z.string().trim().max(200).optional(),
});
