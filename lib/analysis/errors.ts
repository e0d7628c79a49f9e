// The one error type of the computation core. `subject` names the input that
// was unusable (e.g. "yPlus", "window", "cells") so the layer that called us can
// map it to the offending field of a CI submission without parsing messages.
export class AnalysisError extends Error {
  readonly subject: string;

  constructor(subject: string, message: string) {
    super(`${subject}: ${message}`);
    this.name = "AnalysisError";
    this.subject = subject;
  }
}
