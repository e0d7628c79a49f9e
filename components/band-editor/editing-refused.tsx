import Link from "next/link";
import { roleAllows, type Actor } from "@/lib/services/actor";

/** Whether the signed-in person may edit the case library (QA lead or administrator). The server checks every change again. */
export function mayEditLibrary(actor: Actor | null): boolean {
  return actor !== null && actor.kind === "user" && roleAllows(actor.role, "qa");
}

/** What a developer or release manager sees on an editing page: why not, and where to read instead. */
export function EditingRefused({ readHref }: { readHref: string }) {
  return (
    <div role="alert" className="rounded border border-ink/15 bg-paper-raised p-5 text-sm dark:border-white/15 dark:bg-white/5">
      <p className="font-medium">Editing the case library needs the QA lead role.</p>
      <p className="mt-1 text-ink-soft dark:text-white/70">
        Cases, quantity definitions and bands are changed by the QA lead, with a reason kept for every change. You can read the cases, their bands and
        band history in the{" "}
        <Link href={readHref} className="underline">
          case library
        </Link>
        .
      </p>
    </div>
  );
}
