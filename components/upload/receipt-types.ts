import type { QuantityRow } from "@/components/quantities/quantity-table";
import type { Verdict } from "@/lib/analysis";

/** The receipt of submitResults as the upload page asks for it (graphql/operations/upload.ts). */
export interface UploadReceipt {
  created: boolean;
  build: {
    id: string;
    solver: string;
    version: string;
    commit: string;
    branch: string;
    verdict: Verdict;
    runCounts: Record<Verdict, number>;
  };
  runs: {
    id: string;
    case: string;
    model: string;
    grid: string;
    status: string;
    verdict: Verdict;
    quantities: (QuantityRow & { details: Record<string, unknown> })[];
  }[];
}
