"use client";

import { signOut } from "next-auth/react";

export function SignOutButton() {
  return (
    <button onClick={() => signOut({ callbackUrl: "/sign-in" })} className="rounded px-2 py-1 text-sm text-ink-soft hover:bg-ink/5 dark:text-white/70">
      Sign out
    </button>
  );
}
