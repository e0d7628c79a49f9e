import "server-only";
import bcrypt from "bcryptjs";
import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { z } from "zod";
import { getDb } from "@/db";
import { getUserByEmail } from "@/db/queries/identities";
import { getEnv } from "@/lib/env";
import { PEER_HEADER, pickClientAddress } from "./client-address";
import { installPeerStamp, readStampedPeer } from "./peer-stamp";
import { countSignInAttempt } from "./sign-in-throttle";

const credentialsSchema = z.object({
  email: z.email().max(320),
  password: z.string().min(1).max(200),
});

// Normally installed by instrumentation.ts already; this covers a process where it was not.
installPeerStamp();

let dummyHash: string | undefined;
function getDummyHash(): string {
  dummyHash ??= bcrypt.hashSync("not-a-password", 11);
  return dummyHash;
}

// E-mail + password against bcrypt hashes in `users`. The JWT carries the user id,
// the role at sign-in and the sign-in time; lib/auth/session.ts checks the account
// (still active, current role, sessions cut off since) on every request.
export const authOptions: NextAuthOptions = {
  secret: getEnv().NEXTAUTH_SECRET,
  session: { strategy: "jwt", maxAge: 12 * 60 * 60 },
  pages: { signIn: "/sign-in" },
  providers: [
    CredentialsProvider({
      name: "Tauline account",
      credentials: {
        email: { label: "E-mail", type: "email" },
        password: { label: "Password", type: "password" },
      },
      async authorize(unsafeInput, request) {
        const parsed = credentialsSchema.safeParse(unsafeInput);
        // Counted before the password is checked (lib/auth/sign-in-throttle.ts); a refusal
        // throws, and next-auth hands its message to the sign-in form.
        const attempt = await countSignInAttempt({
          email: parsed.success ? parsed.data.email : null,
          address: clientAddressOf(request?.headers ?? {}),
        });
        if (!parsed.success) return null;
        const user = await getUserByEmail({ db: getDb(), email: parsed.data.email });
        // Compare even when the user is unknown so the timing does not reveal which e-mails exist.
        const hash = user?.password_hash ?? getDummyHash();
        const ok = await bcrypt.compare(parsed.data.password, hash);
        if (!user || !ok || !user.active) return null;
        await attempt.succeeded();
        return { id: String(user.id), email: user.email, name: user.name, role: user.role };
      },
    }),
  ],
  callbacks: {
    async jwt({ token, user }) {
      if (user) {
        token.userId = Number(user.id);
        token.role = user.role;
        // Only at sign-in: the token is re-issued on later requests, but this keeps the moment the password was checked.
        token.signedInAt = Date.now();
      }
      return token;
    },
    async session({ session, token }) {
      if (session.user) {
        session.user.id = token.userId;
        session.user.role = token.role;
      }
      session.signedInAt = token.signedInAt ?? 0;
      return session;
    },
  },
};

function clientAddressOf(headers: Record<string, string | string[] | undefined>): string {
  const stamp = headers[PEER_HEADER];
  return pickClientAddress(headers, { trustProxy: getEnv().TRUST_PROXY, peer: readStampedPeer(Array.isArray(stamp) ? stamp[0] : stamp) });
}
