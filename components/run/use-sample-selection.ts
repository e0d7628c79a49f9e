"use client";

import { useSearchParams } from "next/navigation";
import { useCallback } from "react";

/**
 * The stress sample picked on the anisotropy maps, kept in the query string
 * (?sample=3, 1-based) so a link shows the same sample to a colleague. Written
 * with history.replaceState, which Next keeps in step with useSearchParams,
 * so a pick re-renders the maps without a round trip to the server.
 */
export function useSampleSelection(count: number): [number | null, (n: number | null) => void] {
  const params = useSearchParams();
  const raw = params.get("sample");
  const n = raw !== null && /^[1-9][0-9]{0,6}$/.test(raw) ? Number(raw) : null;
  const selected = n !== null && n <= count ? n : null;
  const select = useCallback((next: number | null) => {
    const url = new URL(window.location.href);
    if (next === null) url.searchParams.delete("sample");
    else url.searchParams.set("sample", String(next));
    window.history.replaceState(null, "", `${url.pathname}${url.search}${url.hash}`);
  }, []);
  return [selected, select];
}
