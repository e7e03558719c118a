/**
 * A Content-Disposition header that no file name can break out of: an ASCII fallback with quotes,
 * backslashes and control characters replaced, and the real name percent-encoded (RFC 6266, RFC 5987).
 */
export function contentDisposition(kind: "inline" | "attachment", fileName: string): string {
  // eslint-disable-next-line no-control-regex
  const ascii = fileName.replace(/[^\x20-\x7e]|["\\%;]/g, "_").slice(0, 150) || "file";
  const encoded = encodeURIComponent(fileName).replace(/['()*]/g, (c) => `%${c.charCodeAt(0).toString(16).toUpperCase()}`);
  return `${kind}; filename="${ascii}"; filename*=UTF-8''${encoded}`;
}
