import { z } from "zod";
import { COMMON_PASSWORDS } from "./common-passwords.ts";
import { text } from "./text.ts";

/** The four roles of a service company's people, most rights first. */
export const ROLES = ["owner", "senior", "technician", "apprentice"] as const;
export const RoleSchema = z.enum(ROLES);
export type Role = z.infer<typeof RoleSchema>;

export const ROLE_LABELS: Record<Role, string> = {
  owner: "Owner",
  senior: "Senior technician",
  technician: "Technician",
  apprentice: "Apprentice",
};

/**
 * Who may do what. The server enforces these on every route (requireRole); the client only
 * uses them to hide what the server would refuse anyway.
 */
export const PERMISSIONS = {
  /** Invite, remove and change the role of members; read the outbox. */
  manageMembers: ["owner"],
  /** Sign off or send back a visit. */
  signOff: ["owner", "senior"],
  /** Create and change field records (visits, readings, procedures). Apprentices only read. */
  writeRecords: ["owner", "senior", "technician"],
  /**
   * Read every technician's refrigerant register lines. The register is the company's record
   * under its trading authorisation (TRADE.md §8.1, reg 141: the business keeps it): the owner
   * keeps it and seniors review it.
   */
  readAllRegisterLines: ["owner", "senior"],
  /**
   * Read the register lines one recorded oneself: a technician's licence makes them answerable
   * for their own handling, never a colleague's. Apprentices work under supervision and keep none.
   */
  readOwnRegisterLines: ["owner", "senior", "technician"],
  /**
   * Set or clear a circuit's charge reference point by hand. Every later charge estimate on the
   * unit is measured from it, so it takes the judgement of those who sign work off.
   */
  setChargeReference: ["owner", "senior"],
} as const satisfies Record<string, readonly Role[]>;
export type Permission = keyof typeof PERMISSIONS;

export function can(role: Role, permission: Permission): boolean {
  return (PERMISSIONS[permission] as readonly Role[]).includes(role);
}

export const PASSWORD_MIN_LENGTH = 10;
/** argon2 hashes any length, but an upper bound stops megabyte "passwords" tying up the CPU. */
export const PASSWORD_MAX_LENGTH = 200;
export const NAME_MAX_LENGTH = 100;
/** RFC 5321 limits a forward path to 256 octets, which leaves 254 for the address itself. */
export const EMAIL_MAX_LENGTH = 254;

/** Addresses compare case-insensitively, so they are stored and compared trimmed and lower-case. */
export const EmailSchema = text()
  .toLowerCase()
  .min(1, "Enter an e-mail address")
  .max(EMAIL_MAX_LENGTH, `At most ${EMAIL_MAX_LENGTH} characters`)
  .pipe(z.email("Enter a valid e-mail address, like sam@example.com"));

/**
 * A new password: length first (NIST SP 800-63B §5.1.1.2 favours length over composition
 * rules), then refused when it is on the common list or one character repeated.
 */
export const NewPasswordSchema = text({ trim: false })
  .min(PASSWORD_MIN_LENGTH, `Use at least ${PASSWORD_MIN_LENGTH} characters`)
  .max(PASSWORD_MAX_LENGTH, `At most ${PASSWORD_MAX_LENGTH} characters`)
  // A leaked or guessable password is weak whatever its length.
  .refine((value) => !COMMON_PASSWORDS.has(value.toLowerCase()), "This password is too common; choose another")
  // "aaaaaaaaaa" passes the length rule but is guessed at once.
  .refine((value) => new Set(value).size > 1, "Use more than one kind of character");

export const PersonNameSchema = text()
  .min(1, "Enter a name")
  .max(NAME_MAX_LENGTH, `At most ${NAME_MAX_LENGTH} characters`);

export const OrganisationNameSchema = text()
  .min(1, "Enter the company name")
  .max(NAME_MAX_LENGTH, `At most ${NAME_MAX_LENGTH} characters`);

/** One-time tokens from e-mailed links: 32 random bytes in base64url. */
export const TokenSchema = text().min(20, "This link is incomplete").max(100, "This link is not valid");

/** POST /api/auth/sign-up: a new service company and its first owner. */
export const SignUpSchema = z.object({
  name: PersonNameSchema,
  email: EmailSchema,
  password: NewPasswordSchema,
  organisationName: OrganisationNameSchema,
});
export type SignUp = z.infer<typeof SignUpSchema>;

/** POST /api/auth/sign-in. No password rules here: old passwords must still work. */
export const SignInSchema = z.object({
  email: EmailSchema,
  // Tabs and line breaks pass: a password set before the text rules must still sign in.
  password: text({ trim: false, multiline: true })
    .min(1, "Enter your password")
    .max(PASSWORD_MAX_LENGTH, `At most ${PASSWORD_MAX_LENGTH} characters`),
});
export type SignIn = z.infer<typeof SignInSchema>;

/** The signed-in person as every screen sees them. */
export const AuthUserSchema = z.object({
  id: z.uuid(),
  email: z.string(),
  name: z.string(),
  role: RoleSchema,
  organisationId: z.uuid(),
});
export type AuthUser = z.infer<typeof AuthUserSchema>;

/** GET /api/auth/me, and the body of sign-up, sign-in and invitation acceptance. */
export const MeResponseSchema = z.object({ user: AuthUserSchema });
export type MeResponse = z.infer<typeof MeResponseSchema>;

/** POST /api/auth/password-reset/request */
export const PasswordResetRequestSchema = z.object({ email: EmailSchema });
export type PasswordResetRequest = z.infer<typeof PasswordResetRequestSchema>;

/** POST /api/auth/password-reset/confirm */
export const PasswordResetConfirmSchema = z.object({ token: TokenSchema, password: NewPasswordSchema });
export type PasswordResetConfirm = z.infer<typeof PasswordResetConfirmSchema>;

/** The same answer whether or not the address has an account (no user enumeration). */
export const MessageResponseSchema = z.object({ message: z.string() });
export type MessageResponse = z.infer<typeof MessageResponseSchema>;
