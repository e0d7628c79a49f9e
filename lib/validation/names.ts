import { z } from "zod";

// Free-text names in a submission (solver, version, branch, coefficient names).
// They are stored verbatim, quotes, backslashes and `$1` included (every query is
// parameterised), but PostgreSQL text cannot hold a NUL byte and no name needs a
// control character, so those are refused with the field's path instead of
// failing the INSERT. Lengths are checked before any pattern so a megabyte of
// text is refused without scanning it twice.

/**
 * For free text that may hold newlines (comments, reasons, descriptions): only
 * U+0000 is refused, which PostgreSQL text cannot store. Use as `.refine(...NO_NUL)`.
 */
export const NO_NUL = [(s: string) => !s.includes("\u0000"), "must not contain a NUL character (U+0000)"] as const;

// eslint-disable-next-line no-control-regex
const CONTROL = /[\u0000-\u001f\u007f]/;

export const label = (max: number) =>
  z
    .string()
    .max(max, `must be at most ${max} characters`)
    .trim()
    .min(1, "must not be empty")
    .refine((s) => !CONTROL.test(s), "must not contain control characters (NUL, tab, newline, …)");

/**
 * A branch name as git accepts it (git-check-ref-format(1), the rules for a ref
 * under refs/heads/): no control characters, space, ~ ^ : ? * [ or backslash; no
 * "..", "@{" or "//"; no component starting with "." or ending with ".lock"; not
 * starting with "-" or "/", not ending with "/" or "."; not "@". Quotes, `$`, `;`
 * and the like are legal in git and are stored as given.
 */
export const branchName = z
  .string()
  .max(200, "must be at most 200 characters")
  .trim()
  .min(1, "must not be empty")
  .superRefine((name, ctx) => {
    const problem = findBranchNameProblem(name);
    if (problem) ctx.addIssue({ code: "custom", message: `is not a git branch name: ${problem}` });
  });

export function findBranchNameProblem(name: string): string | null {
  if (CONTROL.test(name)) return "it contains a control character";
  const bad = /[ ~^:?*[\\]/.exec(name);
  if (bad) return `it contains "${bad[0]}"`;
  if (name === "@") return 'it is "@"';
  if (name.includes("..")) return 'it contains ".."';
  if (name.includes("@{")) return 'it contains "@{"';
  if (name.startsWith("-")) return 'it starts with "-"';
  if (name.startsWith("/") || name.endsWith("/") || name.includes("//")) return "it has an empty component (leading, trailing or double /)";
  if (name.endsWith(".")) return 'it ends with "."';
  for (const part of name.split("/")) {
    if (part.startsWith(".")) return `its component "${part}" starts with "."`;
    if (part.endsWith(".lock")) return `its component "${part}" ends with ".lock"`;
  }
  return null;
}
