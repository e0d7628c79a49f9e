"use client";

import { usePathname, useRouter, useSearchParams } from "next/navigation";
import { useCallback } from "react";

/**
 * The stress sample picked on the anisotropy maps, kept in the query string
 * (?sample=3, 1-based) so a link shows the same sample to a colleague.
 */
export function useSampleSelection(count: number): [number | null, (n: number | null) => void] {
  const params = useSearchParams();
  const router = useRouter();
  const pathname = usePathname();
  const raw = params.get("sample");
  const n = raw !== null && /^[1-9][0-9]{0,6}$/.test(raw) ? Number(raw) : null;
  const selected = n !== null && n <= count ? n : null;
  const select = useCallback(
    (next: number | null) => {
      const query = new URLSearchParams(params.toString());
      if (next === null) query.delete("sample");
      else query.set("sample", String(next));
      const text = query.toString();
      router.replace(text ? `${pathname}?${text}` : pathname, { scroll: false });
    },
    [params, pathname, router],
  );
  return [selected, select];
}
