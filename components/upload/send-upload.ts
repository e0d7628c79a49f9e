import type { FieldIssue } from "@/lib/errors";
import { UPLOAD_MUTATION } from "@/graphql/operations/upload";
import type { UploadReceipt } from "./receipt-types";

// The GraphQL multipart request (operations, map, then the file as part "0"),
// sent with XMLHttpRequest because fetch cannot report upload progress. The
// x-tauline-request header is what the server's CSRF check asks of every
// non-JSON request; a form on another site cannot set it.

export type UploadOutcome =
  | { ok: true; receipt: UploadReceipt }
  | { ok: false; status: number; message: string; issues: FieldIssue[] };

export interface UploadRequest {
  file: File;
  input: unknown;
  seriesKey: string | null;
  onProgress: (fraction: number) => void;
}

export function sendUpload({ file, input, seriesKey, onProgress }: UploadRequest): { done: Promise<UploadOutcome>; abort: () => void } {
  const form = new FormData();
  form.append("operations", JSON.stringify({ query: UPLOAD_MUTATION, variables: { input, file: null, seriesKey } }));
  form.append("map", JSON.stringify({ 0: ["variables.file"] }));
  form.append("0", file, file.name);

  const xhr = new XMLHttpRequest();
  const done = new Promise<UploadOutcome>((resolve) => {
    xhr.open("POST", "/api/graphql");
    xhr.setRequestHeader("x-tauline-request", "upload");
    xhr.setRequestHeader("accept", "application/graphql-response+json, application/json");
    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable && e.total > 0) onProgress(e.loaded / e.total);
    };
    xhr.onload = () => resolve(readAnswer(xhr.status, xhr.responseText));
    xhr.onerror = () => resolve({ ok: false, status: 0, message: "The upload did not reach the server (network error).", issues: [] });
    xhr.onabort = () => resolve({ ok: false, status: 0, message: "Upload cancelled.", issues: [] });
    xhr.send(form);
  });
  return { done, abort: () => xhr.abort() };
}

interface Answer {
  data?: { submitResults?: UploadReceipt | null } | null;
  errors?: { message: string; extensions?: { issues?: FieldIssue[] } }[];
}

function readAnswer(status: number, text: string): UploadOutcome {
  let body: Answer;
  try {
    body = JSON.parse(text) as Answer;
  } catch {
    const hint = status === 413 ? "The file is larger than the server accepts." : `The server answered ${status} without a GraphQL body.`;
    return { ok: false, status, message: hint, issues: [] };
  }
  const receipt = body.data?.submitResults;
  if (receipt && !body.errors?.length) return { ok: true, receipt };
  const errors = body.errors ?? [];
  return {
    ok: false,
    status,
    message: errors.map((e) => e.message).join("; ") || `The server answered ${status}.`,
    issues: errors.flatMap((e) => e.extensions?.issues ?? []),
  };
}
