/** Escapes text for HTML element content and attribute values (the five characters HTML treats specially). */
export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);
}

/**
 * The simple HTML part sent beside the plain text: the same words, paragraph by paragraph. Every character of
 * the text is escaped, so anything a client or owner typed (a name, a follow-up's wording) shows as text and
 * never as markup.
 */
export function emailHtml(subject: string, text: string): string {
  const paragraphs = text
    .trim()
    .split(/\n{2,}/)
    .map((p) => `<p style="margin:0 0 1em">${escapeHtml(p).replace(/\n/g, '<br>')}</p>`)
    .join('\n');
  return `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width"><title>${escapeHtml(subject)}</title></head>
<body style="margin:0;padding:24px;background:#f7f3ee;color:#1f2a2e;font:16px/1.5 Helvetica,Arial,sans-serif">
<div style="max-width:560px;margin:0 auto;background:#ffffff;border-radius:8px;padding:24px">
${paragraphs}
</div></body></html>`;
}
