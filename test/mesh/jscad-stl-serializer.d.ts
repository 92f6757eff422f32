// Minimal types for @jscad/stl-serializer (it ships none); only what the cross-check test calls.
declare module '@jscad/stl-serializer' {
  export function serialize(options: { binary?: boolean }, ...objects: unknown[]): ArrayBuffer[] | string[];
}
