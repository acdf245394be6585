const encoder = new TextEncoder();
const BOM = Uint8Array.of(0xef, 0xbb, 0xbf);
/**
 * True when the file started with a UTF-8 BOM: its size is the decoded text's UTF-8 length
 * plus the three bytes of the BOM (only meaningful for files that decoded without problems).
 */
export function hadBom(file) {
    return file.bytes === encoder.encode(file.text).length + BOM.length;
}
/** The bytes of `text` for `file`: UTF-8, with the BOM when the file had one. */
export function encodeText(text, bom) {
    const body = encoder.encode(text);
    if (!bom)
        return body;
    const out = new Uint8Array(body.length + BOM.length);
    out.set(BOM, 0);
    out.set(body, BOM.length);
    return out;
}
