/**
 * Accounts, sign-in and sessions. Server only (`import "server-only"`), apart from the two
 * client-safe files the browser forms import directly.
 *
 * - index.ts (this file): the better-auth instance `auth` (e-mail and password, cookie cache, limits)
 * - session.ts: `requireUser` / `requireTeacher` / `requireStudent`, `getStudioContext` (once per request)
 * - api-session.ts: the route-handler twins `apiMember` / `apiTeacher` (401 / 404, no redirects)
 * - session-memo.ts, sign-in-limit.ts, rate-limit.ts: in-process memo and limits
 * - teacher-sign-up.ts: the public sign-up, a teacher and a new studio in one transaction
 * - client.ts (client-safe): plain POSTs to /api/auth for the sign-in, sign-out and reset forms
 * - password-rules.ts (client-safe, pure): the password length limits
 */
import "server-only";
import { betterAuth } from "better-auth";
import { drizzleAdapter } from "better-auth/adapters/drizzle";
import { nextCookies } from "better-auth/next-js";
import { db } from "../../db";
import * as schema from "../../db/schema";
import { authSecret, readEnv } from "../env";
import { resetPasswordMail, sendMail } from "../mail";
import { ownOrigins } from "../security/origin";
import { afterPasswordReset } from "../security/password-reset";
import { signInLimitHooks } from "./sign-in-limit";
import { MAX_PASSWORD_LENGTH, MIN_PASSWORD_LENGTH } from "./password-rules";

const env = readEnv();

/** Password limits, re-exported for server code that already imports auth (see password-rules). */
export { MIN_PASSWORD_LENGTH, MAX_PASSWORD_LENGTH };
/** How long the signed session copy in the browser is trusted without a database look-up. */
export const SESSION_COOKIE_CACHE_SECONDS = 5 * 60;

/**
 * better-auth, e-mail + password. Accounts are never created through better-auth's own sign-up
 * endpoint: teachers sign up through Knotwork's form (which creates the studio in the same
 * transaction) and students through an invitation, so the role is always decided on the server.
 */
export const auth = betterAuth({
  appName: "Knotwork",
  database: drizzleAdapter(db, { provider: "sqlite", schema }),
  secret: authSecret(env),
  baseURL: env.BETTER_AUTH_URL,
  // The configured origin and its localhost / 127.0.0.1 twin, the same list proxy.ts checks.
  trustedOrigins: ownOrigins(env.BETTER_AUTH_URL),
  telemetry: { enabled: false },
  emailAndPassword: {
    enabled: true,
    minPasswordLength: MIN_PASSWORD_LENGTH,
    maxPasswordLength: MAX_PASSWORD_LENGTH,
    resetPasswordTokenExpiresIn: 60 * 60,
    // A reset signs out every device and voids the user's other reset links (lib/security/password-reset.ts).
    revokeSessionsOnPasswordReset: true,
    onPasswordReset: afterPasswordReset,
    sendResetPassword: async ({ user, url }) => {
      await sendMail({ to: user.email, ...resetPasswordMail({ name: user.name, link: url }) });
    },
  },
  disabledPaths: ["/sign-up/email"],
  rateLimit: {
    enabled: true,
    // In the database (db/limits-schema.ts rateLimit), so a limit holds across app servers.
    storage: "database",
    window: env.AUTH_RATE_LIMIT_WINDOW,
    max: env.AUTH_RATE_LIMIT_MAX,
    customRules: {
      "/sign-in/email": { window: env.AUTH_RATE_LIMIT_WINDOW, max: env.AUTH_SIGN_IN_MAX },
    },
  },
  // Per-account limit on failed sign-ins, whatever address the client claims (lib/auth/sign-in-limit.ts).
  hooks: signInLimitHooks,
  session: {
    expiresIn: 60 * 60 * 24 * 14,
    updateAge: 60 * 60 * 24,
    // A signed copy of the session in a second cookie: most requests skip the session and user
    // lookups. Trade-off: a signed-out or revoked session keeps working for up to maxAge seconds
    // on a browser that still holds the copy (DEVELOPERS.md, "Sessions").
    cookieCache: { enabled: true, maxAge: SESSION_COOKIE_CACHE_SECONDS },
  },
  plugins: [nextCookies()],
});

export type AuthSession = typeof auth.$Infer.Session;
