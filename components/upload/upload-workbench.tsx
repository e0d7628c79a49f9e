"use client";

import { useApolloClient } from "@apollo/client/react";
import { useDeferredValue, useEffect, useMemo, useRef, useState } from "react";
import { Panel } from "@/components/ui/panel";
import { EmptyState } from "@/components/ui/states";
import type { FieldIssue } from "@/lib/errors";
import type { UploadKind } from "@/lib/validation/upload";
import { checkChosenFile, csvInputOf, type RunFields } from "./check-upload";
import { CheckSummary } from "./check-summary";
import { CsvRunForm, SeriesKeyPicker } from "./csv-run-form";
import { FileDrop } from "./file-drop";
import { forgetStaleReads } from "./forget-stale-reads";
import { FormatSwitch } from "./format-switch";
import { IssueList } from "./issue-list";
import type { UploadReceipt } from "./receipt-types";
import { SendBar } from "./send-bar";
import { sendUpload } from "./send-upload";
import { UploadReceiptView } from "./upload-receipt";
import { useUploadParams } from "./use-upload-params";

type Phase =
  | { name: "editing" }
  | { name: "sending"; progress: number; abort: () => void }
  | { name: "sent"; receipt: UploadReceipt }
  | { name: "refused"; message: string; issues: FieldIssue[] };

const BLANK: Omit<RunFields, "case" | "model"> = { solver: "", version: "", commit: "", branch: "", pipelineUrl: "", grid: "", status: "COMPLETED" };

/** The manual-upload page's working area: choose, check in the browser, send, read the receipt. */
export function UploadWorkbench({ maxBytes }: { maxBytes: number }) {
  const url = useUploadParams();
  const [rest, setRest] = useState(BLANK);
  const fields: RunFields = { ...rest, case: url.caseKey, model: url.model };
  const [file, setFile] = useState<File | null>(null);
  const [text, setText] = useState<string | null>(null);
  const [phase, setPhase] = useState<Phase>({ name: "editing" });
  const receiptRef = useRef<HTMLDivElement>(null);
  const client = useApolloClient();

  useEffect(() => {
    let live = true;
    setText(null);
    if (file && file.size <= maxBytes) file.text().then((t) => live && setText(t));
    return () => {
      live = false;
    };
  }, [file, maxBytes]);

  // A large CSV is re-parsed on each change; deferring keeps typing in the form responsive.
  const fieldsKey = useDeferredValue(JSON.stringify(fields));
  const deferredText = useDeferredValue(text);
  const seriesKey = useDeferredValue(url.seriesKey);
  const kind = useDeferredValue(url.kind);
  const check = useMemo(
    () => checkChosenFile({ file, text: deferredText, kind, fields: JSON.parse(fieldsKey) as RunFields, seriesKey, maxBytes }),
    [file, deferredText, kind, fieldsKey, seriesKey, maxBytes],
  );

  const edit = () => phase.name === "refused" && setPhase({ name: "editing" });
  const onField = (patch: Partial<RunFields>) => {
    edit();
    const { case: caseKey, model, ...others } = patch;
    if (caseKey !== undefined || model !== undefined) url.update({ ...(caseKey !== undefined ? { case: caseKey } : {}), model: model ?? (caseKey !== undefined ? null : url.model) });
    if (Object.keys(others).length) setRest((r) => ({ ...r, ...others }));
  };
  const send = () => {
    if (!file) return;
    const request = sendUpload({
      file,
      input: url.kind === "csv" ? csvInputOf(fields) : null,
      seriesKey: url.kind === "csv" ? url.seriesKey : null,
      onProgress: (progress) => setPhase((p) => (p.name === "sending" ? { ...p, progress } : p)),
    });
    setPhase({ name: "sending", progress: 0, abort: request.abort });
    request.done.then((outcome) => {
      setPhase(outcome.ok ? { name: "sent", receipt: outcome.receipt } : { name: "refused", message: outcome.message, issues: outcome.issues });
      if (outcome.ok) forgetStaleReads(client);
      // The receipt renders below the form; bring it into view once it is there.
      if (outcome.ok) requestAnimationFrame(() => receiptRef.current?.scrollIntoView({ behavior: "smooth", block: "start" }));
    });
  };
  const again = () => {
    setFile(null);
    setPhase({ name: "editing" });
  };

  const fieldIssues = [...(check?.issues ?? []), ...(phase.name === "refused" ? phase.issues : [])];
  const reading = check === null || deferredText !== text;
  // Send only what the shown check covered, not a form edited since.
  const current = !reading && kind === url.kind && seriesKey === url.seriesKey && fieldsKey === JSON.stringify(fields);
  return (
    <>
      <div className="grid items-start gap-5 lg:grid-cols-[minmax(0,7fr)_minmax(0,5fr)]">
        <div className="space-y-5">
          <Panel title="File">
            <FormatSwitch value={url.kind} onChange={(kind: UploadKind) => (edit(), url.update({ format: kind === "csv" ? "csv" : null }))} />
            <FileDrop kind={url.kind} file={file} onFile={(f) => (edit(), setFile(f))} />
            {url.kind === "csv" && (
              <>
                <p className="mt-2 text-xs text-ink-soft dark:text-white/60">
                  First line: the two column names (free text, e.g. <code className="font-mono">y+,u+</code>). Then one x,y pair per line, separated by comma, tab, semicolon or |, with a decimal point (1.5e-3 is fine). Errors name the file row: its line number, header = row 1.
                </p>
                <div className="mt-3">
                  <SeriesKeyPicker value={url.seriesKey} error={fieldIssues.find((i) => i.path === "seriesKey")?.message} onChange={(k) => (edit(), url.update({ series: k }))} />
                </div>
              </>
            )}
          </Panel>
          {url.kind === "csv" && (
            <Panel title="Build and run of this series" subtitle="The CSV becomes this run's series; the build may already exist.">
              <CsvRunForm fields={fields} issues={fieldIssues} onField={onField} />
            </Panel>
          )}
        </div>
        <Panel title="Check before sending" subtitle="Same schema as the server" className="lg:sticky lg:top-4">
          <div className="space-y-4">
            {phase.name === "sent" ? (
              <p className="flex items-center gap-2 text-sm font-medium text-verdict-within" role="status">
                <span aria-hidden>●</span> Sent and stored; the receipt is below.
              </p>
            ) : !file ? (
              <EmptyState title="No file chosen yet">The file is checked here against the CI contract before anything leaves the browser; problems are listed by field path.</EmptyState>
            ) : reading || !check ? (
              <p className="text-sm text-ink-soft dark:text-white/60" role="status">
                Reading {file.name}…
              </p>
            ) : (
              <CheckSummary check={check} seriesKey={url.kind === "csv" ? url.seriesKey : null} />
            )}
            {phase.name !== "sent" && (
              <SendBar ready={current && !!check && check.issues.length === 0} sending={phase.name === "sending"} progress={phase.name === "sending" ? phase.progress : 0} onSend={send} onCancel={() => phase.name === "sending" && phase.abort()} />
            )}
            {phase.name === "refused" && (
              <IssueList title="The server refused the upload; nothing was stored" issues={phase.issues.length ? phase.issues : [{ path: "request", message: phase.message }]} />
            )}
          </div>
        </Panel>
      </div>
      <div ref={receiptRef} className="scroll-mt-4">
        {phase.name === "sent" && <UploadReceiptView receipt={phase.receipt} plotsFirst={phase.receipt.runs.length === 1} onAgain={again} />}
      </div>
    </>
  );
}
