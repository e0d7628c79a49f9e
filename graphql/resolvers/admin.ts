import { acceptPasswordLink, inviteUser, issuePasswordLink } from "@/lib/services/invites";
import { createCiToken, listAccountChanges, listCiTokens, revokeCiToken } from "@/lib/services/tokens";
import { createUserAccount, deactivateUserAccount, listUserAccounts, reactivateUserAccount, setUserRole } from "@/lib/services/users";
import type { GraphQLContext } from "../context";

type Ctx = GraphQLContext;

// Guard clauses live in the services (role first, then input); resolvers only pass through.
export const adminResolvers = {
  Query: {
    userAccounts: (_: unknown, __: unknown, ctx: Ctx) => listUserAccounts({ actor: ctx.actor }),
    ciTokens: (_: unknown, __: unknown, ctx: Ctx) => listCiTokens({ actor: ctx.actor }),
    accountChanges: (_: unknown, args: { last?: number | null }, ctx: Ctx) => listAccountChanges({ actor: ctx.actor, unsafeLimit: args.last }),
  },
  Mutation: {
    createUser: (_: unknown, args: { input: unknown }, ctx: Ctx) => createUserAccount({ actor: ctx.actor, unsafeInput: args.input }),
    inviteUser: (_: unknown, args: { input: unknown }, ctx: Ctx) => inviteUser({ actor: ctx.actor, unsafeInput: args.input }),
    issuePasswordLink: (_: unknown, args: { userId: unknown }, ctx: Ctx) => issuePasswordLink({ actor: ctx.actor, unsafeUserId: args.userId }),
    setUserRole: (_: unknown, args: { userId: unknown; role: unknown }, ctx: Ctx) => setUserRole({ actor: ctx.actor, unsafeInput: args }),
    deactivateUser: (_: unknown, args: { userId: unknown }, ctx: Ctx) => deactivateUserAccount({ actor: ctx.actor, unsafeUserId: args.userId }),
    reactivateUser: (_: unknown, args: { userId: unknown }, ctx: Ctx) => reactivateUserAccount({ actor: ctx.actor, unsafeUserId: args.userId }),
    createCiToken: (_: unknown, args: { input: unknown }, ctx: Ctx) => createCiToken({ actor: ctx.actor, unsafeInput: args.input }),
    revokeCiToken: (_: unknown, args: { id: unknown }, ctx: Ctx) => revokeCiToken({ actor: ctx.actor, unsafeId: args.id }),
    setPasswordWithLink: (_: unknown, args: { input: unknown }) => acceptPasswordLink({ unsafeInput: args.input }),
  },
};
