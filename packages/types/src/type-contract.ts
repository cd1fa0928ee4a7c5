/**
 * Type-level checks that a schema written in this package describes exactly a type declared
 * elsewhere (geo-core's results), so the two cannot drift apart unnoticed.
 *
 * Usage, in a `*.check.ts` file beside the schema:
 *
 *   import type { ConsolidationTestResult as FromGeoCore } from '@porestack/geo-core';
 *   export type ConsolidationTestResultChecked = Assert<MatchesSource<z.infer<typeof ConsolidationTestResultSchema>, FromGeoCore>>;
 *
 * `tsc -b` then fails when a field is added, removed, renamed, made optional or given another
 * type on either side, and the error names what differs, e.g.
 *   Type '{ onlySchema: "dryMass"; onlySource: "dryMassG"; differing: never }' does not satisfy the constraint 'true'.
 * A difference nested deeper shows up under `differing` by its top-level name; check the nested
 * types too (each on its own line) so the error points at the part that moved.
 *
 * readonly is set aside: geo-core marks its results readonly, zod infers writable objects, and
 * JSON carries neither.
 */

/** T with every readonly property and readonly array made writable, all the way down. */
export type DeepWritable<T> = T extends (...args: never[]) => unknown
  ? T
  : T extends readonly (infer Item)[]
    ? DeepWritable<Item>[]
    : T extends object
      ? { -readonly [K in keyof T]: DeepWritable<T[K]> }
      : T;

/**
 * true when A and B are the same type once readonly is set aside, false otherwise. Stricter than
 * assignability both ways: an optional field on one side and a required one on the other differ.
 */
export type SameShape<A, B> =
  (<T>() => T extends DeepWritable<A> ? 1 : 2) extends <T>() => T extends DeepWritable<B> ? 1 : 2 ? true : false;

/** What differs between two object types at the top level: keys on one side only, and keys whose types differ. */
export type ShapeDifference<Schema, Source> = {
  onlySchema: Exclude<keyof Schema, keyof Source>;
  onlySource: Exclude<keyof Source, keyof Schema>;
  differing: { [K in keyof Schema & keyof Source]: SameShape<Schema[K], Source[K]> extends true ? never : K }[keyof Schema & keyof Source];
};

/**
 * `true` when the schema's inferred type is the source type (readonly aside); otherwise the
 * difference, which `Assert` refuses with the difference in the error message.
 */
export type MatchesSource<Schema, Source> =
  SameShape<Schema, Source> extends true ? true : { [K in keyof ShapeDifference<Schema, Source>]: ShapeDifference<Schema, Source>[K] };

/** Compiles only when given `true`: `export type Checked = Assert<MatchesSource<Schema, Source>>`. */
export type Assert<T extends true> = T;
