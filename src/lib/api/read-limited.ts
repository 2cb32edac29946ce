/**
 * Reads a request body into memory, stopping as soon as it passes `cap` bytes (declared or
 * actually sent), so an oversized upload costs at most the cap. `tooLarge` builds the error to
 * throw, given the byte count seen, so each route keeps its own message.
 */
export async function readLimited(
  request: Request,
  cap: number,
  tooLarge: (bytesSeen: number) => Error,
): Promise<Uint8Array> {
  const declared = Number(request.headers.get('content-length'));
  if (Number.isFinite(declared) && declared > cap) throw tooLarge(declared);
  if (!request.body) return new Uint8Array(0);
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > cap) {
      await reader.cancel().catch(() => undefined);
      throw tooLarge(total);
    }
    chunks.push(value);
  }
  const bytes = new Uint8Array(total);
  let offset = 0;
  for (const chunk of chunks) {
    bytes.set(chunk, offset);
    offset += chunk.byteLength;
  }
  return bytes;
}
