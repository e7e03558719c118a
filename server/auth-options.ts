import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { authSecret } from "../env";
import { verifyCredentials } from "../db/queries/users";
import { signInSchema } from "../app/(auth)/sign-in/sign-in.schema";
import type { Role } from "../lib/auth/roles";

export const authOptions: NextAuthOptions = {
  session: { strategy: "jwt", maxAge: 12 * 60 * 60 },
  pages: { signIn: "/sign-in", error: "/sign-in" },
  get secret() {
    return authSecret();
  },
  providers: [
    CredentialsProvider({
      name: "E-mail and password",
      credentials: { email: { label: "E-mail", type: "email" }, password: { label: "Password", type: "password" } },
      async authorize(raw) {
        const parsed = signInSchema.safeParse(raw ?? {});
        if (!parsed.success) return null;
        const user = await verifyCredentials(parsed.data.email, parsed.data.password);
        return user ? { id: user.id, name: user.name, email: user.email, role: user.role } : null;
      },
    }),
  ],
  callbacks: {
    async jwt({ token, user }) {
      if (user) {
        token.uid = user.id;
        token.role = (user as unknown as { role: Role }).role;
      }
      return token;
    },
    async session({ session, token }) {
      session.user = { ...session.user, id: token.uid as string, role: token.role as Role } as typeof session.user;
      return session;
    },
  },
};
