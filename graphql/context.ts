import { createHash } from "node:crypto";
import { GraphQLError } from "graphql";
import { getDb } from "@/db";
import { useCiTokenByHash } from "@/db/queries/identities";
import { getRequestActor } from "@/lib/auth/session";
import type { RequestNote } from "@/lib/http/request-log";
import type { Actor } from "@/lib/services/actor";
import { createLoaders, type Loaders } from "./loaders";

export interface GraphQLContext {
  actor: Actor | null;
  loaders: Loaders;
}

/**
 * Who is asking: a CI pipeline (Authorization: Bearer <token>) or a signed-in
 * person (next-auth session cookie). A bearer header that is malformed, unknown,
 * revoked or expired is refused with 401 before anything runs.
 */
export async function createContext({ request, note }: { request: Request; note?: RequestNote }): Promise<GraphQLContext> {
  const db = getDb();
  const header = request.headers.get("authorization");
  let actor: Actor | null = null;
  if (header !== null) {
    // Marked refused first: a throw below leaves it so for the request's log line.
    if (note) note.actor = "refused";
    const match = /^Bearer\s+([\x21-\x7e]{16,512})$/i.exec(header.trim());
    if (!match) throw unauthenticated("The Authorization header must be `Bearer <CI token>`.");
    const token = await useCiTokenByHash({ db, tokenHash: createHash("sha256").update(match[1], "utf8").digest("hex") });
    if (!token) throw unauthenticated("The CI token is unknown, revoked or expired.");
    actor = { kind: "ci", tokenId: token.id, label: `ci:${token.name}` };
  } else {
    actor = await getRequestActor();
  }
  if (note) note.actor = actor ? actor.kind : "anonymous";
  return { actor, loaders: createLoaders(db) };
}

function unauthenticated(message: string) {
  return new GraphQLError(message, { extensions: { code: "UNAUTHENTICATED", http: { status: 401, headers: { "WWW-Authenticate": "Bearer" } } } });
}
