// Times are shown in UTC everywhere in Tauline, so a shared link reads the same for
// the whole team whatever the viewer's time zone.
const dateTime = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeStyle: "short", timeZone: "UTC" });

export function formatUtc(iso: string | Date): string {
  return `${dateTime.format(typeof iso === "string" ? new Date(iso) : iso)} UTC`;
}
