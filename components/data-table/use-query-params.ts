"use client";

import { usePathname, useSearchParams } from "next/navigation";
import { useCallback } from "react";

/**
 * The page's query string as state: read with `params`, change with `update`
 * (null or "" removes a key).
 *
 * Writes go through window.history.replaceState, which Next's router observes
 * (useSearchParams updates) without a server round trip: selecting a cell or a
 * page re-renders only the client leaves, and filtering piles up no history
 * entries. Each update starts from the URL as it is now, not from the params of
 * the last render, so two quick changes cannot overwrite each other.
 */
export function useQueryParams() {
  const pathname = usePathname();
  const params = useSearchParams();
  const update = useCallback(
    (patch: Record<string, string | number | null | undefined>) => {
      const next = new URLSearchParams(window.location.search);
      for (const [key, value] of Object.entries(patch)) {
        if (value === null || value === undefined || value === "") next.delete(key);
        else next.set(key, String(value));
      }
      const qs = next.toString();
      window.history.replaceState(null, "", qs ? `${pathname}?${qs}` : pathname);
    },
    [pathname],
  );
  return { params, update };
}
