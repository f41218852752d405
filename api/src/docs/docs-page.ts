import type { OpenApiGeneratorV31 } from '@asteasolutions/zod-to-openapi';

type OpenApiDocument = ReturnType<OpenApiGeneratorV31['generateDocument']>;

function escapeHtml(text: string): string {
  return text.replaceAll('&', '&amp;').replaceAll('<', '&lt;').replaceAll('>', '&gt;');
}

const methods = ['get', 'post', 'put', 'patch', 'delete'] as const;

/** A small self-contained HTML index of the operations (no script; the CSP stays strict). */
export function renderDocsPage(document: OpenApiDocument): string {
  const rows: string[] = [];
  for (const [path, item] of Object.entries(document.paths ?? {})) {
    for (const method of methods) {
      const op = item?.[method];
      if (!op) continue;
      const secured = (op.security ?? []).length > 0 ? 'bearer token' : 'public';
      rows.push(
        `<tr><td class="m ${method}">${method.toUpperCase()}</td>` +
          `<td><code>${escapeHtml(path)}</code></td>` +
          `<td>${escapeHtml(op.summary ?? '')}</td><td>${secured}</td></tr>`,
      );
    }
  }
  return `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><title>Couplet API</title>
<style>
body{font-family:system-ui,sans-serif;margin:2rem;color:#1d2a33}
table{border-collapse:collapse;width:100%}
td,th{padding:.35rem .6rem;border-bottom:1px solid #dde3e8;text-align:left}
.m{font-weight:600;font-family:monospace}.get{color:#1b6e4f}.post{color:#2a4d9c}
.patch{color:#8a5a00}.delete{color:#a3262e}
</style></head><body>
<h1>Couplet API ${escapeHtml(document.info.version)}</h1>
<p>Machine-readable document: <a href="/api/docs/openapi.json">/api/docs/openapi.json</a>.
Errors are RFC 9457 problem details with a <code>code</code> and, where one field is at fault,
its <code>field</code>.</p>
<table><thead><tr><th>Method</th><th>Path</th><th>What it does</th><th>Access</th></tr></thead>
<tbody>
${rows.join('\n')}
</tbody></table></body></html>`;
}
