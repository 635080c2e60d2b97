/**
 * Looks into a ZIP package without unpacking it: the names of its files and
 * the size they declare unpacked, from the central directory at the end of
 * the file (PKWARE APPNOTE 6.3, sections 4.3.12 and 4.3.16). An .xlsx
 * workbook is such a package (ECMA-376 part 2, Open Packaging Conventions), so
 * this tells a workbook from another ZIP file, and a workbook too large to
 * read in memory from one that fits, before any of it is unpacked.
 *
 * Pure: runs in Node and in the browser.
 */

/** The first bytes of every ZIP file that starts with a file entry: "PK\x03\x04". */
const localFileSignature = [0x50, 0x4b, 0x03, 0x04] as const;
const endOfDirectorySignature = 0x06054b50;
const directoryEntrySignature = 0x02014b50;
/** The end record is 22 bytes plus a comment of up to 65,535 bytes. */
const endRecordSize = 22;
const maxCommentSize = 0xffff;

export function startsLikeZip(bytes: Uint8Array): boolean {
  return localFileSignature.every((byte, index) => bytes[index] === byte);
}

export type ZipContents =
  | {
      ok: true;
      names: string[];
      /** The sum of the sizes the entries declare unpacked, in bytes. */
      unpackedBytes: number;
    }
  | { ok: false };

/** The entries listed in the package's central directory; `{ ok: false }` when there is none to read. */
export function readZipContents(bytes: Uint8Array): ZipContents {
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const end = findEndRecord(view);
  if (end === -1) return { ok: false };
  const entryCount = view.getUint16(end + 10, true);
  const directorySize = view.getUint32(end + 12, true);
  const directoryStart = view.getUint32(end + 16, true);
  // ZIP64 packages mark these fields as 0xFFFF / 0xFFFFFFFF: far beyond what is read here.
  if (
    entryCount === 0xffff ||
    directoryStart === 0xffffffff ||
    directoryStart + directorySize > end
  )
    return { ok: false };

  const names: string[] = [];
  let unpackedBytes = 0;
  let at = directoryStart;
  const decoder = new TextDecoder("utf-8");
  for (let entry = 0; entry < entryCount; entry += 1) {
    if (at + 46 > end || view.getUint32(at, true) !== directoryEntrySignature)
      return { ok: false };
    const unpacked = view.getUint32(at + 24, true);
    if (unpacked === 0xffffffff) return { ok: false };
    const nameLength = view.getUint16(at + 28, true);
    const extraLength = view.getUint16(at + 30, true);
    const commentLength = view.getUint16(at + 32, true);
    if (at + 46 + nameLength > end) return { ok: false };
    names.push(decoder.decode(bytes.subarray(at + 46, at + 46 + nameLength)));
    unpackedBytes += unpacked;
    at += 46 + nameLength + extraLength + commentLength;
  }
  return { ok: true, names, unpackedBytes };
}

/** The offset of the end-of-central-directory record, searched from the end; -1 when missing. */
function findEndRecord(view: DataView): number {
  const last = view.byteLength - endRecordSize;
  const first = Math.max(0, last - maxCommentSize);
  for (let at = last; at >= first; at -= 1) {
    if (view.getUint32(at, true) === endOfDirectorySignature) return at;
  }
  return -1;
}
