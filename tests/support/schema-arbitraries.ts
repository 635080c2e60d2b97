/**
 * fast-check arbitraries from the contract's JSON Schemas (OpenAPI 3.1, JSON Schema
 * 2020-12): values that keep to a schema's types, bounds, patterns and required fields
 * (so a request reaches past validation into the route), and values that break it
 * (so the refusals are exercised too). Only the keywords the Zod-made document uses
 * are read; any other part of a schema yields any JSON value.
 */
import fc from "fast-check";

type Schema = Record<string, unknown> & {
  type?: string | string[];
  $ref?: string;
};

/** Resolves "#/components/schemas/X" against the document. */
export type RefResolver = (ref: string) => Schema;

const anyJson = fc.jsonValue({ maxDepth: 2 });

function stringArbitrary(schema: Schema): fc.Arbitrary<string> {
  const minLength = (schema.minLength as number | undefined) ?? 0;
  const maxLength = Math.min(
    (schema.maxLength as number | undefined) ?? 24,
    minLength + 24,
  );
  if (typeof schema.pattern === "string") {
    try {
      const pattern = new RegExp(schema.pattern);
      return fc
        .stringMatching(pattern)
        .filter((text) => text.length >= minLength && text.length <= maxLength);
    } catch {
      // A pattern JavaScript cannot read: plain strings then.
    }
  }
  switch (schema.format) {
    case "email":
      return fc.emailAddress();
    case "date":
      return fc
        .date({
          min: new Date("2020-01-01"),
          max: new Date("2030-12-31"),
          noInvalidDate: true,
        })
        .map((day) => day.toISOString().slice(0, 10));
    case "date-time":
      return fc
        .date({
          min: new Date("2020-01-01"),
          max: new Date("2030-12-31"),
          noInvalidDate: true,
        })
        .map((moment) => moment.toISOString());
  }
  return fc.string({ minLength, maxLength });
}

function numberArbitrary(
  schema: Schema,
  integer: boolean,
): fc.Arbitrary<number> {
  const bound = (key: string) => schema[key] as number | undefined;
  const exclusiveMin = bound("exclusiveMinimum");
  const exclusiveMax = bound("exclusiveMaximum");
  const min =
    bound("minimum") ??
    (exclusiveMin !== undefined ? exclusiveMin + (integer ? 1 : 1e-3) : -1e6);
  const max =
    bound("maximum") ??
    (exclusiveMax !== undefined ? exclusiveMax - (integer ? 1 : 1e-3) : 1e6);
  const low = Math.max(min, -1e9);
  const high = Math.min(max, 1e9);
  if (integer || schema.type === "integer")
    return fc.integer({ min: Math.ceil(low), max: Math.floor(high) });
  // Three decimals at most: quantities and prices keep that many.
  return fc
    .integer({ min: Math.ceil(low * 1000), max: Math.floor(high * 1000) })
    .map((thousandths) => thousandths / 1000);
}

/** Values that keep to `schema`. */
export function validValue(
  schema: Schema,
  resolve: RefResolver,
  depth = 0,
): fc.Arbitrary<unknown> {
  if (depth > 6) return fc.constant(null);
  if (schema.$ref) return validValue(resolve(schema.$ref), resolve, depth + 1);
  if ("const" in schema) return fc.constant(schema.const);
  if (Array.isArray(schema.enum))
    return fc.constantFrom(...(schema.enum as unknown[]));
  for (const key of ["oneOf", "anyOf"] as const) {
    const options = schema[key] as Schema[] | undefined;
    if (options?.length)
      return fc.oneof(
        ...options.map((option) => validValue(option, resolve, depth + 1)),
      );
  }
  if (Array.isArray(schema.allOf) && schema.allOf.length === 1)
    return validValue(schema.allOf[0] as Schema, resolve, depth + 1);
  const types = Array.isArray(schema.type)
    ? schema.type
    : schema.type
      ? [schema.type]
      : [];
  if (types.length > 1)
    return fc.oneof(
      ...types.map((type) =>
        validValue({ ...schema, type }, resolve, depth + 1),
      ),
    );
  switch (types[0]) {
    case "null":
      return fc.constant(null);
    case "boolean":
      return fc.boolean();
    case "string":
      return stringArbitrary(schema);
    case "integer":
      return numberArbitrary(schema, true);
    case "number":
      return numberArbitrary(schema, false);
    case "array": {
      const items = (schema.items as Schema | undefined) ?? {};
      return fc.array(validValue(items, resolve, depth + 1), {
        minLength: (schema.minItems as number | undefined) ?? 0,
        maxLength: Math.min((schema.maxItems as number | undefined) ?? 3, 3),
      });
    }
    case "object": {
      const properties =
        (schema.properties as Record<string, Schema> | undefined) ?? {};
      const required = (schema.required as string[] | undefined) ?? [];
      const model: Record<string, fc.Arbitrary<unknown>> = {};
      for (const [name, property] of Object.entries(properties))
        model[name] = validValue(property, resolve, depth + 1);
      if (Object.keys(model).length === 0)
        return fc.dictionary(fc.string({ maxLength: 8 }), anyJson, {
          maxKeys: 3,
        });
      return fc.record(model, {
        requiredKeys: required.filter((name) => name in model),
      });
    }
  }
  return anyJson;
}

/** Values that may break `schema`: a field missing or of another type, or any JSON at all. */
export function breakingValue(
  schema: Schema,
  resolve: RefResolver,
): fc.Arbitrary<unknown> {
  const resolved = schema.$ref ? resolve(schema.$ref) : schema;
  const properties = resolved.properties as Record<string, Schema> | undefined;
  const options: fc.Arbitrary<unknown>[] = [anyJson];
  if (properties && Object.keys(properties).length > 0) {
    const names = Object.keys(properties);
    options.push(
      fc
        .tuple(
          validValue(resolved, resolve),
          fc.constantFrom(...names),
          anyJson,
        )
        .map(([value, name, replacement]) => ({
          ...(value as object),
          [name]: replacement,
        })),
      fc
        .tuple(validValue(resolved, resolve), fc.constantFrom(...names))
        .map(([value, name]) => {
          const copy = { ...(value as Record<string, unknown>) };
          delete copy[name];
          return copy;
        }),
    );
  }
  return fc.oneof(...options);
}
