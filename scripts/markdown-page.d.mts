// Types of scripts/markdown-page.mjs for the TypeScript tests that import it.

export function escapeHtml(text: string): string;
export function inlineHtml(text: string): string;
export function markdownToHtml(markdown: string): { html: string; title: string | undefined; ids: string[] };
export function markdownPage(markdown: string): { page: string; ids: string[] };
