"use client";

import Link from "next/link";
import { usePathname } from "next/navigation";

// Our own names for the places in the app; each says what you do there.
type Role = "developer" | "qa" | "release" | "admin";

// `roles` only decides what is shown; the server checks every action again.
const LINKS: { href: string; label: string; roles?: Role[] }[] = [
  { href: "/", label: "Morning view" },
  { href: "/builds", label: "Builds" },
  { href: "/trends", label: "Trends" },
  { href: "/cases", label: "Case library" },
  { href: "/gate", label: "Release gate" },
  { href: "/upload", label: "Manual upload" },
  { href: "/settings", label: "My alerts" },
  { href: "/admin", label: "Administration", roles: ["admin"] },
];

export function MainNav({ role }: { role: Role }) {
  const pathname = usePathname();
  return (
    <nav aria-label="Main" className="flex flex-wrap gap-1">
      {LINKS.filter((l) => !l.roles || l.roles.includes(role)).map((l) => {
        const active = l.href === "/" ? pathname === "/" : pathname.startsWith(l.href);
        return (
          <Link
            key={l.href}
            href={l.href}
            aria-current={active ? "page" : undefined}
            className={`rounded px-2.5 py-1 text-sm ${active ? "bg-tide-700 text-white" : "text-ink-soft hover:bg-ink/5 dark:text-white/70 dark:hover:bg-white/10"}`}
          >
            {l.label}
          </Link>
        );
      })}
    </nav>
  );
}
