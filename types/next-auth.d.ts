import type { DefaultSession } from "next-auth";

type Role = "developer" | "qa" | "release" | "admin";

declare module "next-auth" {
  interface Session {
    user: DefaultSession["user"] & { id: number; role: Role };
  }
  interface User {
    role: Role;
  }
}

declare module "next-auth/jwt" {
  interface JWT {
    userId: number;
    role: Role;
  }
}
