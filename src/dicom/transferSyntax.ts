// Transfer syntaxes: which Lamina reads, and the names of the others so a refusal names what the
// file uses. UIDs and names from DICOM PS3.6 Annex A (Registry of DICOM Unique Identifiers).
export const IMPLICIT_VR_LITTLE_ENDIAN = '1.2.840.10008.1.2';
export const EXPLICIT_VR_LITTLE_ENDIAN = '1.2.840.10008.1.2.1';

export const SUPPORTED_TRANSFER_SYNTAXES: readonly string[] = [
  IMPLICIT_VR_LITTLE_ENDIAN,
  EXPLICIT_VR_LITTLE_ENDIAN,
];

const NAMES: Record<string, string> = {
  [IMPLICIT_VR_LITTLE_ENDIAN]: 'Implicit VR Little Endian',
  [EXPLICIT_VR_LITTLE_ENDIAN]: 'Explicit VR Little Endian',
  '1.2.840.10008.1.2.1.99': 'Deflated Explicit VR Little Endian',
  '1.2.840.10008.1.2.2': 'Explicit VR Big Endian (retired)',
  '1.2.840.10008.1.2.4.50': 'JPEG Baseline (Process 1)',
  '1.2.840.10008.1.2.4.51': 'JPEG Extended (Process 2 & 4)',
  '1.2.840.10008.1.2.4.57': 'JPEG Lossless, Non-Hierarchical (Process 14)',
  '1.2.840.10008.1.2.4.70': 'JPEG Lossless, Non-Hierarchical, First-Order Prediction',
  '1.2.840.10008.1.2.4.80': 'JPEG-LS Lossless Image Compression',
  '1.2.840.10008.1.2.4.81': 'JPEG-LS Lossy (Near-Lossless) Image Compression',
  '1.2.840.10008.1.2.4.90': 'JPEG 2000 Image Compression (Lossless Only)',
  '1.2.840.10008.1.2.4.91': 'JPEG 2000 Image Compression',
  '1.2.840.10008.1.2.4.201': 'High-Throughput JPEG 2000 Image Compression (Lossless Only)',
  '1.2.840.10008.1.2.4.202':
    'High-Throughput JPEG 2000 with RPCL Options Image Compression (Lossless Only)',
  '1.2.840.10008.1.2.4.203': 'High-Throughput JPEG 2000 Image Compression',
  '1.2.840.10008.1.2.5': 'RLE Lossless',
};

export function transferSyntaxName(uid: string): string {
  return NAMES[uid] ?? 'not a transfer syntax Lamina knows';
}

export function isSupportedTransferSyntax(uid: string): boolean {
  return SUPPORTED_TRANSFER_SYNTAXES.includes(uid);
}

/** The refusal for a file in a transfer syntax Lamina does not read, naming UID and name. */
export function unsupportedTransferSyntaxMessage(uid: string): string {
  return (
    `transfer syntax ${uid} (${transferSyntaxName(uid)}) is not read by Lamina: it reads ` +
    `${NAMES[IMPLICIT_VR_LITTLE_ENDIAN]} (${IMPLICIT_VR_LITTLE_ENDIAN}) and ` +
    `${NAMES[EXPLICIT_VR_LITTLE_ENDIAN]} (${EXPLICIT_VR_LITTLE_ENDIAN}); ` +
    'export the series uncompressed from the planning system or PACS'
  );
}
