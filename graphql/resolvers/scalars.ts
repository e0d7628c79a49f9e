import { GraphQLScalarType, Kind, type ValueNode } from "graphql";

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
