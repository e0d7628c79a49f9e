import { AppError, type FieldIssue } from "@/lib/errors";
import { getEnv } from "@/lib/env";
import { requireSubmitter } from "@/lib/services/authorize";
import { readReceiptRuns, submitResults } from "@/lib/services/ingest";
import { assembleUpload, describeUploadIssues, locateCsvIssues, type AssembledUpload } from "@/lib/validation/upload";
import type { GraphQLContext } from "../context";

interface SubmitArgs {
  input?: unknown;
  /** A web File from the GraphQL multipart request (yoga parses it). */
  file?: File | null;
  seriesKey?: string | null;
}

export const Mutation = {
  async submitResults(_: unknown, args: SubmitArgs, ctx: GraphQLContext) {
    const upload = args.file ? await readUpload(args, ctx) : null;
    if (!upload) checkPlainArguments(args);
    let result;
    try {
      result = await submitResults({ actor: ctx.actor, unsafeInput: upload ? upload.unsafeInput : args.input });
    } catch (error) {
      // Schema issues inside a CSV series also name the file row they came from.
      if (upload?.csv && error instanceof AppError && error.issues.length) {
        const issues = locateCsvIssues(error.issues, upload.csv);
        throw new AppError(error.code, describeUploadIssues(issues), issues);
      }
      throw error;
    }
    // Runs by key, not by the ids just inserted: a concurrent re-post of this build may have replaced them since the commit.
    const [build, runs] = await Promise.all([ctx.loaders.build.load(result.buildId), readReceiptRuns(result)]);
    return { build, runs, created: result.created };
  },
};

// Without a file the mutation is the CI contract as before: input is required.
function checkPlainArguments(args: SubmitArgs) {
  const issues: FieldIssue[] = [];
  if (args.input == null) issues.push({ path: "input", message: "is required unless a results file is uploaded" });
  if (args.seriesKey != null) issues.push({ path: "seriesKey", message: "only applies together with a CSV series file" });
  if (issues.length) throw new AppError("invalid_input", describeUploadIssues(issues), issues);
}

/** Checks who sends before reading the file, then turns it into a raw submission. */
async function readUpload(args: SubmitArgs, ctx: GraphQLContext): Promise<AssembledUpload> {
  requireSubmitter(ctx.actor);
  const file = args.file!;
  const limit = getEnv().MAX_BODY_BYTES;
  if (file.size > limit) {
    const issues = [{ path: "file", message: `is ${formatMegabytes(file.size)}; the limit is ${formatMegabytes(limit)}` }];
    throw new AppError("invalid_input", describeUploadIssues(issues), issues);
  }
  const assembled = assembleUpload({ input: args.input, seriesKey: args.seriesKey, file: { name: file.name, type: file.type, text: await file.text() } });
  if (!assembled.ok) throw new AppError("invalid_input", describeUploadIssues(assembled.issues), assembled.issues);
  return assembled.value;
}

function formatMegabytes(bytes: number): string {
  return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
}
