"use client";

import { usePathname, useRouter, useSearchParams } from "next/navigation";
import { useCallback } from "react";
import { UPLOAD_SERIES_KEYS, type UploadKind, type UploadSeriesKey } from "@/lib/validation/upload";

/**
 * The choices worth sharing as a link live in the query string: the file format,
 * and for a CSV the case, model and series key ("upload a k(t) for decaying-hit
 * with k-epsilon"). Build details and the file itself stay in the page.
 */
export function useUploadParams() {
  const router = useRouter();
  const pathname = usePathname();
  const params = useSearchParams();
  const series = params.get("series");
  const update = useCallback(
    (patch: Record<string, string | null>) => {
      const next = new URLSearchParams(params.toString());
      for (const [key, value] of Object.entries(patch)) {
        if (value) next.set(key, value);
        else next.delete(key);
      }
      const qs = next.toString();
      router.replace(qs ? `${pathname}?${qs}` : pathname, { scroll: false });
    },
    [params, pathname, router],
  );
  return {
    kind: (params.get("format") === "csv" ? "csv" : "json") as UploadKind,
    seriesKey: UPLOAD_SERIES_KEYS.includes(series as UploadSeriesKey) ? (series as UploadSeriesKey) : null,
    caseKey: params.get("case") ?? "",
    model: params.get("model") ?? "",
    update,
  };
}
