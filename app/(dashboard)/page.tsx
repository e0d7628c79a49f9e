import { VerdictBadge } from "@/components/ui/verdict-badge";
import { getLatestBuilds } from "@/lib/services/overview";

export const dynamic = "force-dynamic";

const dateFormat = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeStyle: "short", timeZone: "UTC" });

export default async function HomePage() {
  const builds = await getLatestBuilds({ limit: 40 });
  return (
    <section>
      <h1 className="text-xl font-semibold tracking-tight">Latest builds</h1>
      <p className="mt-1 text-sm text-ink-soft dark:text-white/60">
        Every build CI posted, newest first, judged against the tolerance bands of the canonical cases.
      </p>
      {builds.length === 0 ? (
        <p className="mt-6 rounded border border-dashed border-ink/20 p-6 text-sm">
          No builds yet. Post results with the curl line in the README.
        </p>
      ) : (
        <div className="mt-4 overflow-x-auto rounded-lg border border-ink/10 bg-paper-raised dark:bg-white/5">
          <table className="w-full text-sm">
            <thead className="bg-paper-sunk/60 text-left text-xs uppercase tracking-wide text-ink-faint dark:bg-white/5">
              <tr>
                <th className="px-3 py-2">Received (UTC)</th>
                <th className="px-3 py-2">Branch</th>
                <th className="px-3 py-2">Version</th>
                <th className="px-3 py-2">Commit</th>
                <th className="px-3 py-2">Verdict</th>
                <th className="px-3 py-2 text-right">Runs within / marginal / outside / other</th>
                <th className="px-3 py-2">Gate</th>
              </tr>
            </thead>
            <tbody>
              {builds.map((b) => (
                <tr key={b.id} className="border-t border-ink/5" data-build-id={b.id}>
                  <td className="px-3 py-2 whitespace-nowrap tabular-nums">{dateFormat.format(b.receivedAt)}</td>
                  <td className="px-3 py-2 font-mono text-xs">{b.branch}</td>
                  <td className="px-3 py-2">
                    {b.solver} {b.version}
                  </td>
                  <td className="px-3 py-2 font-mono text-xs">{b.commit.slice(0, 10)}</td>
                  <td className="px-3 py-2">
                    <VerdictBadge verdict={b.verdict} />
                  </td>
                  <td className="px-3 py-2 text-right font-mono text-xs tabular-nums">
                    {b.runCounts.within} / {b.runCounts.marginal} / {b.runCounts.outside} / {b.runCounts.unbanded + b.runCounts.missing}
                  </td>
                  <td className="px-3 py-2 text-xs">{b.gate}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </section>
  );
}
