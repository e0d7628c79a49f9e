import { Suspense } from "react";
import { UploadWorkbench } from "@/components/upload/upload-workbench";
import { PageTitle } from "@/components/ui/panel";
import { LoadingBlock } from "@/components/ui/states";
import { getEnv } from "@/lib/env";

export const metadata = { title: "Manual upload · Tauline" };

export default function UploadPage() {
  return (
    <section>
      <PageTitle
        title="Manual upload"
        lead="Send results by hand through the same path CI uses: checked here against the CI contract first, then derived and judged against the tolerance bands on the server, in one transaction."
      />
      {/* The workbench reads its choices from the query string. */}
      <Suspense fallback={<LoadingBlock label="Loading the upload form" rows={6} />}>
        <UploadWorkbench maxBytes={getEnv().MAX_BODY_BYTES} />
      </Suspense>
    </section>
  );
}
