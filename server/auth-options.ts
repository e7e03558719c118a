import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { authSecret, servedOverHttps } from "../env";
import { verifyCredentials } from "../db/queries/users";
import { endSessions } from "../db/queries/sessions";
import { accountState, forgetAccount } from "./account-cache";
import { signInSchema } from "../app/(auth)/sign-in/sign-in.schema";
import type { Role } from "../lib/auth/roles";

type SignedInUser = { id: string; name: string; email: string; role: Role; sessionVersion: number };

/**
 * next-auth handles sign-in and sign-out only; each request reads the cookie through
 * server/session.ts. The token carries the person's session version (`sv`): raising it in the
 * database ends every session issued before.
 */
export const authOptions: NextAuthOptions = {
  session: { strategy: "jwt", maxAge: 12 * 60 * 60 },
  pages: { signIn: "/sign-in", error: "/sign-in" },
  get secret() {
    return authSecret();
  },
  // Secure cookies (and their __Secure- names) whenever the public address is HTTPS, even when a
  // proxy in front talks plain HTTP to the app.
  get useSecureCookies() {
    return servedOverHttps();
  },
  providers: [
    CredentialsProvider({
      name: "E-mail and password",
      credentials: { email: { label: "E-mail", type: "email" }, password: { label: "Password", type: "password" } },
      async authorize(raw) {
        const parsed = signInSchema.safeParse(raw ?? {});
        if (!parsed.success) return null;
        const user = await verifyCredentials(parsed.data.email, parsed.data.password);
        return user ? { id: user.id, name: user.name, email: user.email, role: user.role, sessionVersion: user.sessionVersion } : null;
      },
    }),
  ],
  callbacks: {
    async jwt({ token, user }) {
      if (user) {
        const u = user as unknown as SignedInUser;
        token.uid = u.id;
        token.role = u.role;
        token.sv = u.sessionVersion;
        return token;
      }
      // Reading the session through next-auth's own route: a revoked token is refused (and its
      // cookie cleared by next-auth); the role is the current one.
      const account = typeof token.uid === "string" ? await accountState(token.uid) : null;
      if (!account || !account.active || account.sessionVersion !== token.sv) throw new Error("This session has ended.");
      token.role = account.role;
      return token;
    },
    async session({ session, token }) {
      session.user = { ...session.user, id: token.uid as string, role: token.role as Role } as typeof session.user;
      return session;
    },
  },
  events: {
    // Sign-out ends the person's sessions everywhere, not just this browser's cookie.
    async signOut({ token }) {
      if (typeof token?.uid === "string" && typeof token.sv === "number") {
        await endSessions(token.uid, token.sv);
        forgetAccount(token.uid);
      }
    },
  },
};
