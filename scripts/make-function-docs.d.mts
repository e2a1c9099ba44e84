// Types of scripts/make-function-docs.mjs for the TypeScript tests that import it.

/** The custom-functions metadata as generated from the JSDoc (the shape of functions.json). */
export interface FunctionsMetadata {
  functions: {
    name: string;
    description?: string;
    helpUrl?: string;
    parameters: { name: string; description?: string; optional?: boolean; dimensionality?: string; type?: string }[];
    result?: { type?: string; dimensionality?: string };
  }[];
}

export const DOCS_FILE: string;
export function manifestNamespace(manifestXml?: string): string;
export function generatedMetadata(): Promise<FunctionsMetadata>;
export function renderFunctionDocs(metadata: FunctionsMetadata, namespace: string): string;
export function renderFunctionDocsPage(metadata: FunctionsMetadata, namespace: string): { page: string; ids: string[] };
