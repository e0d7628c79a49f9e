import { AlertSettings } from "@/components/alerts/alert-settings";
import { PageTitle } from "@/components/ui/panel";

export const metadata = { title: "My alerts · Tauline" };

export default function MyAlertsPage() {
  return (
    <>
      <PageTitle title="My alerts" lead="Choose which band exits, failed runs and drifts reach you by e-mail, and how often." />
      <AlertSettings />
    </>
  );
}
