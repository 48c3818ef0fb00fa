/** A document and the fragments it spreads, as one text: each part is written as a `/* GraphQL *\/` template so codegen reads it. */
export function withFragments(source: string, ...fragments: string[]): string {
  return [source, ...fragments].join('\n');
}
