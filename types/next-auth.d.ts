import type { Role } from "../lib/auth/roles";

declare module "next-auth" {
  interface Session {
    user: { id: string; role: Role; name?: string | null; email?: string | null };
  }
}
