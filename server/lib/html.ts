/** Escapes text for HTML element content and attribute values. */
export function escapeHtml(value: unknown): string {
  return String(value)
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/"/g, '&quot;')
    .replace(/'/g, '&#39;');
}

const PRINT_STYLE = `
  body { font: 14px/1.45 Georgia, 'Times New Roman', serif; color: #1d1b19; margin: 2rem auto; max-width: 46rem; padding: 0 1rem; }
  h1 { font-size: 1.5rem; margin: 0 0 .25rem; } h2 { font-size: 1.1rem; margin: 1.5rem 0 .5rem; }
  table { border-collapse: collapse; width: 100%; } th, td { text-align: left; padding: .35rem .5rem; border-bottom: 1px solid #ccc; vertical-align: top; }
  .muted { color: #5b554f; } .caution { border: 1px solid #999; padding: .75rem 1rem; margin-top: 1.5rem; }
  @media print { body { margin: 0; } a { color: inherit; text-decoration: none; } }
`;

/** A self-contained printable page; `body` must already be escaped. */
export function printablePage(title: string, body: string): string {
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1"><title>${escapeHtml(title)}</title><style>${PRINT_STYLE}</style></head><body>${body}</body></html>`;
}
