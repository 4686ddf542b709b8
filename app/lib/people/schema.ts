import { z } from "zod";
import { ROLES } from "./roles";

/** At least 10 characters and nothing else demanded (NIST SP 800-63B: length over composition rules). */
export const MIN_PASSWORD = 10;

/** An e-mail address as every form takes it: trimmed, lower-cased, whole. */
export const emailAddress = (whose: "your" | "their") =>
  z
    .string({ error: `Enter ${whose} e-mail.` })
    .trim()
    .toLowerCase()
    .min(1, `Enter ${whose} e-mail.`)
    .max(254, "That e-mail is too long.")
    .email("Enter a whole e-mail address, like name@company.com.");

const role = z.enum(ROLES, { error: "Pick a role: crew, trainer, supervisor or admin." });
const personId = z.coerce.number({ error: "personId must be a number" }).int().positive("personId must be a person's number");

export const inviteSchema = z.object({
  name: z.string({ error: "Enter the person's name." }).trim().min(1, "Enter the person's name.").max(120, "Keep the name under 120 characters."),
  email: emailAddress("their"),
  role,
});

/** What the people page can be asked to do with someone already there or invited. */
export const personActionSchema = z.discriminatedUnion(
  "intent",
  [
    z.object({ intent: z.literal("role"), personId, role }),
    z.object({ intent: z.literal("remove-access"), personId, confirmed: z.literal("yes", { error: "Confirm turning the sign-in off." }) }),
    z.object({ intent: z.literal("restore-access"), personId }),
    z.object({ intent: z.literal("cancel-invite"), inviteId: z.coerce.number({ error: "inviteId must be a number" }).int().positive() }),
  ],
  { error: "Say what to do: role, remove-access, restore-access or cancel-invite." },
);

/**
 * bcrypt reads only the first 72 bytes of a password (UTF-8): anything past them would not count,
 * so a longer password is refused rather than silently cut.
 */
export const MAX_PASSWORD_BYTES = 72;
export const fitsBcrypt = (password: string) => new TextEncoder().encode(password).length <= MAX_PASSWORD_BYTES;
export const TOO_LONG = `Keep the password to ${MAX_PASSWORD_BYTES} bytes (72 plain letters; accented letters and symbols count 2–4 each): anything longer would be cut short when stored.`;

const newPassword = {
  password: z
    .string({ error: "Choose a password." })
    .min(MIN_PASSWORD, `Use at least ${MIN_PASSWORD} characters; a few words strung together make a good one.`)
    .refine(fitsBcrypt, TOO_LONG),
  confirm: z.string({ error: "Type the password again." }),
};
const sameTwice = (v: { password: string; confirm: string }) => v.password === v.confirm;
const notSame = { path: ["confirm"], message: "The two passwords are not the same." };

/** A first password (joining) or a new one from an e-mailed link. */
export const choosePasswordSchema = z.object(newPassword).refine(sameTwice, notSame);

/** A new password while signed in: the current one first, so a borrowed phone cannot change it. */
export const changePasswordSchema = z
  .object({ current: z.string({ error: "Enter your current password." }).min(1, "Enter your current password."), ...newPassword })
  .refine(sameTwice, notSame);

export type InviteInput = z.infer<typeof inviteSchema>;
export type PersonAction = z.infer<typeof personActionSchema>;

/** The sign-in form: checked in the browser and again by the sign-in strategy. */
export const signInSchema = z.object({
  email: emailAddress("your"),
  password: z.string({ error: "Enter your password." }).min(1, "Enter your password.").refine(fitsBcrypt, TOO_LONG),
});

/** "Forgot your password?": only the address. */
export const forgotSchema = z.object({ email: emailAddress("your") });
