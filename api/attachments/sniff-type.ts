import { fileTypeFromBuffer } from 'file-type';

const TEXT_DECODER = new TextDecoder('utf-8', { fatal: true });

function looksLikeText(content: Buffer): boolean {
  if (content.includes(0)) return false;
  try {
    TEXT_DECODER.decode(content);
    return true;
  } catch {
    return false;
  }
}

/**
 * The media type from the bytes themselves (magic numbers, via file-type), never from what the
 * client claims: valid UTF-8 without NUL bytes is plain text, anything else unknown is opaque.
 */
export async function sniffMediaType(content: Buffer): Promise<string> {
  const detected = await fileTypeFromBuffer(content);
  if (detected) return detected.mime;
  return looksLikeText(content) ? 'text/plain; charset=utf-8' : 'application/octet-stream';
}
