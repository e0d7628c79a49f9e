import { getOperationAST } from "graphql";
import type { Plugin } from "graphql-yoga";
import type { RequestNote } from "@/lib/http/request-log";

// Fills the route's request note with the operation's name, for the one log
// line per request (lib/http/request-log.ts). The name is taken from the
// request's operationName, else from the document itself (a CI curl line sends
// only the query). Variables are never looked at.

interface NotedContext {
  note?: RequestNote;
}

export function useRequestNotes(): Plugin<NotedContext> {
  return {
    onParams({ params, context }) {
      const note = (context as NotedContext | undefined)?.note;
      if (note && typeof params.operationName === "string") note.operation = params.operationName.slice(0, 100);
    },
    onExecute({ args }) {
      const note = (args.contextValue as NotedContext).note;
      if (!note || note.operation) return;
      note.operation = getOperationAST(args.document, args.operationName)?.name?.value ?? "(anonymous)";
    },
  };
}
