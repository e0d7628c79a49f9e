import { PageTitle } from "@/components/ui/panel";
import { LoadingBlock } from "@/components/ui/states";

export default function BuildsLoading() {
  return (
    <section>
      <PageTitle title="Builds" />
      <LoadingBlock label="Loading builds" rows={10} />
    </section>
  );
}
