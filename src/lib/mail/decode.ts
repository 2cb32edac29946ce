/**
 * Reads the subject and text body of a single-part message as nodemailer writes it (encoded
 * words in headers, base64 or quoted-printable bodies). Own code because the parsing package
 * that pairs with nodemailer is not part of our stack and only the fake SMTP server needs this.
 */
export interface DecodedMail {
  subject: string;
  body: string;
}

function headerMap(head: string): Map<string, string> {
  const map = new Map<string, string>();
  for (const line of head.replace(/\r?\n[ \t]+/g, ' ').split(/\r?\n/)) {
    const i = line.indexOf(':');
    if (i > 0) map.set(line.slice(0, i).trim().toLowerCase(), line.slice(i + 1).trim());
  }
  return map;
}

function qpBytes(text: string, underscoreIsSpace: boolean): Buffer {
  const src = (underscoreIsSpace ? text.replace(/_/g, ' ') : text).replace(/=\r?\n/g, '');
  const bytes: number[] = [];
  for (let i = 0; i < src.length; i++) {
    if (src[i] === '=' && /^[0-9A-Fa-f]{2}$/.test(src.slice(i + 1, i + 3))) {
      bytes.push(parseInt(src.slice(i + 1, i + 3), 16));
      i += 2;
    } else bytes.push(...Buffer.from(src[i], 'utf8'));
  }
  return Buffer.from(bytes);
}

/** Decodes RFC 2047 encoded words (`=?UTF-8?Q?...?=`, `=?UTF-8?B?...?=`) in a header value. */
export function decodeWords(value: string): string {
  return value
    .replace(/\?=\s+=\?/g, '?==?')
    .replace(/=\?([^?]+)\?([BbQq])\?([^?]*)\?=/g, (_m, _charset: string, enc: string, data: string) =>
      (enc.toUpperCase() === 'B' ? Buffer.from(data, 'base64') : qpBytes(data, true)).toString('utf8'),
    );
}

/** Subject and body of a raw message. */
export function decodeMail(raw: string): DecodedMail {
  const split = raw.search(/\r?\n\r?\n/);
  const head = split < 0 ? raw : raw.slice(0, split);
  const rest = split < 0 ? '' : raw.slice(split).replace(/^\r?\n\r?\n/, '');
  const headers = headerMap(head);
  const encoding = (headers.get('content-transfer-encoding') ?? '7bit').toLowerCase();
  const body =
    encoding === 'base64' ? Buffer.from(rest.replace(/\s+/g, ''), 'base64').toString('utf8')
      : encoding === 'quoted-printable' ? qpBytes(rest, false).toString('utf8')
        : rest;
  return { subject: decodeWords(headers.get('subject') ?? ''), body: body.replace(/\r\n/g, '\n').trimEnd() };
}
