import { PageTitle } from "@/components/ui/panel";

export default function MorningViewPage() {
  return <PageTitle title="Morning view" lead="Loading the widgets…" />;
}
