// Types for the parts of the xliff package (a devDependency, untyped) that the round-trip test drives.
declare module 'xliff/xliff2js' {
  export default function xliff2js(xml: string): Promise<unknown>;
}
declare module 'xliff/js2xliff' {
  export default function js2xliff(document: unknown, options?: { indent?: string }): Promise<string>;
}
