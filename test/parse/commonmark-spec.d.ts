/** The `commonmark-spec` package ships no types: its examples, as its index.js builds them. */
declare module 'commonmark-spec' {
  interface SpecExample {
    readonly markdown: string;
    readonly html: string;
    readonly section: string;
    readonly number: number;
  }
  const spec: { readonly tests: readonly SpecExample[]; readonly text: string };
  export default spec;
}
