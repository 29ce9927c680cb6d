/**
 * A server type as the web receives it over JSON: every `Date` becomes its ISO string
 * (`JSON.stringify` calls `toJSON`), in objects and arrays at any depth. The web derives its
 * response types from the server's own (`api/**\/*.schemas.ts`, types only) through this one
 * mapping instead of copying them by hand.
 */
export type Jsonified<T> = T extends Date
  ? string
  : T extends readonly (infer Item)[]
    ? Jsonified<Item>[]
    : T extends object
      ? { [Key in keyof T]: Jsonified<T[Key]> }
      : T;
