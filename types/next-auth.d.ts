import type { DefaultSession } from "next-auth";

type Role = "developer" | "qa" | "release" | "admin";

declare module "next-auth" {
  interface Session {
    user: DefaultSession["user"] & { id: number; role: Role };
    /** When the person signed in (ms since the epoch); older sessions end when an account is switched off or its password reset. */
    signedInAt?: number;
  }
  interface User {
    role: Role;
  }
}

declare module "next-auth/jwt" {
  interface JWT {
    userId: number;
    role: Role;
    signedInAt?: number;
  }
}
