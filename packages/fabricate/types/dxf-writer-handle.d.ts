declare module 'dxf-writer/src/Handle.js' {
  /** dxf-writer's module-wide entity handle counter. */
  const Handle: { seed: number; next(): string; peek(): string };
  export default Handle;
}
