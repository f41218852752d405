// A minimal reader of RFC 5322 / MIME messages, enough for the mail our own nodemailer writes:
// header unfolding, RFC 2047 encoded words, multipart bodies, quoted-printable and base64.
// mailparser is not a dependency of the project, and the capture server needs no more than this.

export interface ParsedMail {
  from: string;
  to: string;
  subject: string;
  messageId: string;
  text: string;
  html: string | null;
}

type Headers = Map<string, string>;

function splitHeaderBody(raw: string): { headers: Headers; body: string } {
  const normalised = raw.replace(/\r\n/g, '\n');
  const end = normalised.indexOf('\n\n');
  const head = end === -1 ? normalised : normalised.slice(0, end);
  const body = end === -1 ? '' : normalised.slice(end + 2);
  const headers: Headers = new Map();
  // Unfold: a line starting with white space continues the previous header (RFC 5322 §2.2.3).
  for (const line of head.replace(/\n[ \t]+/g, ' ').split('\n')) {
    const colon = line.indexOf(':');
    if (colon <= 0) continue;
    const name = line.slice(0, colon).trim().toLowerCase();
    if (!headers.has(name)) headers.set(name, line.slice(colon + 1).trim());
  }
  return { headers, body };
}

function decodeBytes(bytes: Uint8Array, charset: string): string {
  try {
    return new TextDecoder(charset || 'utf-8').decode(bytes);
  } catch {
    return new TextDecoder('utf-8').decode(bytes);
  }
}

function decodeQuotedPrintable(text: string): Uint8Array {
  const soft = text.replace(/=\n/g, '');
  const bytes: number[] = [];
  for (let i = 0; i < soft.length; i += 1) {
    const hex = soft.slice(i + 1, i + 3);
    if (soft[i] === '=' && /^[0-9A-Fa-f]{2}$/.test(hex)) {
      bytes.push(parseInt(hex, 16));
      i += 2;
    } else {
      bytes.push(...new TextEncoder().encode(soft[i]));
    }
  }
  return Uint8Array.from(bytes);
}

/** RFC 2047 encoded words, e.g. `=?UTF-8?Q?Join_=22Tarnholm=22?=`. */
export function decodeEncodedWords(value: string): string {
  return value
    .replace(/\?=\s+=\?/g, '?==?')
    .replace(
      /=\?([^?]+)\?([BbQq])\?([^?]*)\?=/g,
      (_m, charset: string, enc: string, data: string) =>
        enc.toUpperCase() === 'B'
          ? decodeBytes(Buffer.from(data, 'base64'), charset)
          : decodeBytes(decodeQuotedPrintable(data.replace(/_/g, ' ')), charset),
    );
}

function parameter(headerValue: string, name: string): string {
  const match = new RegExp(`${name}\\s*=\\s*(?:"([^"]*)"|([^;\\s]+))`, 'i').exec(headerValue);
  return match?.[1] ?? match?.[2] ?? '';
}

function decodePart(headers: Headers, body: string): string {
  const encoding = (headers.get('content-transfer-encoding') ?? '7bit').toLowerCase();
  const charset = parameter(headers.get('content-type') ?? '', 'charset');
  if (encoding === 'base64') return decodeBytes(Buffer.from(body, 'base64'), charset);
  if (encoding === 'quoted-printable') return decodeBytes(decodeQuotedPrintable(body), charset);
  return body;
}

function collectParts(headers: Headers, body: string, out: { text?: string; html?: string }) {
  const type = (headers.get('content-type') ?? 'text/plain').toLowerCase();
  if (type.startsWith('multipart/')) {
    const boundary = parameter(headers.get('content-type') ?? '', 'boundary');
    if (!boundary) return;
    const sections = body.split(`--${boundary}`);
    // The text before the first boundary is a preamble and the part after `--boundary--` an
    // epilogue; both are ignored.
    for (const section of sections.slice(1)) {
      if (section.startsWith('--')) break;
      const part = splitHeaderBody(section.replace(/^\n/, ''));
      collectParts(part.headers, part.body.replace(/\n$/, ''), out);
    }
    return;
  }
  if (type.startsWith('text/html')) out.html ??= decodePart(headers, body);
  else if (type.startsWith('text/plain')) out.text ??= decodePart(headers, body);
}

export function parseMimeMessage(raw: string): ParsedMail {
  const { headers, body } = splitHeaderBody(raw);
  const parts: { text?: string; html?: string } = {};
  // The line break that ends the message belongs to no part.
  collectParts(headers, body.replace(/\n$/, ''), parts);
  return {
    from: decodeEncodedWords(headers.get('from') ?? ''),
    to: decodeEncodedWords(headers.get('to') ?? ''),
    subject: decodeEncodedWords(headers.get('subject') ?? ''),
    messageId: headers.get('message-id') ?? '',
    text: parts.text ?? '',
    html: parts.html ?? null,
  };
}
