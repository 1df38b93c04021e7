/** Escapes text for an XML text node or attribute value, and drops characters XML 1.0 forbids. */
export function escapeXml(text: string): string {
  // eslint-disable-next-line no-control-regex
  if (!/[&<>"'\u0000-\u001f\ud800-\udfff\ufffe\uffff]/.test(text)) return text;
  return text
    // eslint-disable-next-line no-control-regex
    .replace(/[\u0000-\u0008\u000b\u000c\u000e-\u001f\ufffe\uffff]/g, '')
    .replace(/[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/g, '')
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/"/g, '&quot;')
    .replace(/'/g, '&apos;');
}
