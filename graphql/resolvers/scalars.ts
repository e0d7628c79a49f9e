import { GraphQLError, GraphQLScalarType, Kind, type ValueNode } from "graphql";
import { SUBMISSION_LIMITS } from "@/lib/validation/limits";

export const DateTime = new GraphQLScalarType<Date | null, string>({
  name: "DateTime",
  description: "An instant as an ISO 8601 string in UTC.",
  serialize(value) {
    const d = value instanceof Date ? value : new Date(String(value));
    if (Number.isNaN(d.getTime())) throw new TypeError("DateTime cannot represent an invalid date");
    return d.toISOString();
  },
  parseValue(value) {
    const d = new Date(String(value));
    if (Number.isNaN(d.getTime())) throw new TypeError("DateTime must be an ISO 8601 date");
    return d;
  },
  parseLiteral(ast) {
    if (ast.kind !== Kind.STRING) throw new TypeError("DateTime must be a string");
    return new Date(ast.value);
  },
});

export const JSONScalar = new GraphQLScalarType({
  name: "JSON",
  description: "Any JSON value (fit details, settings).",
  serialize: (value) => value,
  parseValue: (value) => value,
  parseLiteral: function literal(ast: ValueNode): unknown {
    switch (ast.kind) {
      case Kind.STRING:
      case Kind.BOOLEAN:
        return ast.value;
      case Kind.INT:
      case Kind.FLOAT:
        return Number(ast.value);
      case Kind.OBJECT:
        return Object.fromEntries(ast.fields.map((f) => [f.name.value, literal(f.value)]));
      case Kind.LIST:
        return ast.values.map(literal);
      default:
        return null;
    }
  },
});

/**
 * A profile of numbers (a series' x or y). On the wire it is exactly what
 * `[Float!]!` was: a JSON array of numbers, so CI clients see no change. Why a
 * scalar: graphql-js coerces a `[Float!]!` element by element (a path object and
 * a Float check per number, then a snapshot copy), which for a 1.2-million-number
 * build cost more than deriving and storing it. Here the array is taken as it
 * came out of JSON.parse, without a copy; the one pass over its numbers (finite,
 * monotone where the derivation needs it) is the submission schema's
 * (lib/validation/numbers.ts), which names the offending element's full path,
 * e.g. input.runs[3].series[0].y[17]. The length cap is checked here already so
 * an oversized list is refused before anything walks it.
 */
export const FloatSeries = new GraphQLScalarType<number[], number[]>({
  name: "FloatSeries",
  description: "A list of numbers (a profile's x or y values), sent as a JSON array of numbers.",
  serialize: (value) => value as number[],
  parseValue(value) {
    // As for [Float!]!, a single number is a list of one.
    const list = Array.isArray(value) ? value : [value];
    checkLength(list.length);
    return list as number[];
  },
  parseLiteral(ast) {
    const nodes = ast.kind === Kind.LIST ? ast.values : [ast];
    checkLength(nodes.length);
    return nodes.map((node, i) => {
      if (node.kind === Kind.INT || node.kind === Kind.FLOAT) return Number(node.value);
      throw new GraphQLError(`FloatSeries element [${i}] must be a number literal`, { nodes: node, extensions: { code: "BAD_USER_INPUT" } });
    });
  },
});

function checkLength(length: number) {
  const max = SUBMISSION_LIMITS.pointsPerSeries;
  if (length > max) throw new GraphQLError(`holds ${length} values; the limit is ${max}`, { extensions: { code: "BAD_USER_INPUT" } });
}
