// A picked file's text, decoded as the command line decodes files (src/io/textDecoding): the
// encoding is named when it is not plain UTF-8, and a file that cannot be read says why.
import { decodeTextBytes, type DecodedText } from '../io/textDecoding';

export async function readTextFile(file: File): Promise<DecodedText> {
  try {
    return decodeTextBytes(new Uint8Array(await file.arrayBuffer()));
  } catch (e) {
    return {
      ok: false,
      problem: `could not be read (${e instanceof Error ? e.message : String(e)})`,
    };
  }
}
