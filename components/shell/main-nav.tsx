"use client";

import Link from "next/link";
import { usePathname } from "next/navigation";

// Our own names for the places in the app; each says what you do there.
const LINKS = [
  { href: "/", label: "Morning view" },
  { href: "/builds", label: "Builds" },
  { href: "/trends", label: "Trends" },
  { href: "/cases", label: "Case library" },
  { href: "/upload", label: "Manual upload" },
];

export function MainNav() {
  const pathname = usePathname();
  return (
    <nav aria-label="Main" className="flex flex-wrap gap-1">
      {LINKS.map((l) => {
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
