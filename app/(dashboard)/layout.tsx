import Link from "next/link";
import { headers } from "next/headers";
import { redirect } from "next/navigation";
import type { ReactNode } from "react";
import { MainNav } from "@/components/shell/main-nav";
import { SignOutButton } from "@/components/shell/sign-out-button";
import { ApolloProvider } from "@/graphql/client/apollo-provider";
import { getCurrentSession } from "@/lib/auth/session";

const ROLE_LABEL = { developer: "solver developer", qa: "QA lead", release: "release manager", admin: "administrator" } as const;

export default async function DashboardLayout({ children }: { children: ReactNode }) {
  const session = await getCurrentSession();
  if (!session?.user) redirect("/sign-in");
  // The CSP nonce proxy.ts put on the request, for Apollo's data-transport scripts.
  const nonce = (await headers()).get("x-nonce") ?? undefined;
  return (
    <ApolloProvider nonce={nonce}>
      <div className="border-b border-ink/10 bg-paper-raised/70 dark:border-white/10 dark:bg-white/5">
        <div className="mx-auto flex max-w-7xl flex-wrap items-center gap-x-6 gap-y-2 px-6 py-2">
          <Link href="/" className="font-semibold tracking-tight text-tide-700 dark:text-tide-300">
            Tauline
          </Link>
          <MainNav role={session.user.role} />
          <div className="ml-auto flex items-center gap-3 text-sm">
            <span className="text-ink-soft dark:text-white/70">
              {session.user.name} · <span data-testid="role">{ROLE_LABEL[session.user.role]}</span>
            </span>
            <SignOutButton />
          </div>
        </div>
      </div>
      <main className="mx-auto max-w-7xl px-6 py-6">{children}</main>
    </ApolloProvider>
  );
}
