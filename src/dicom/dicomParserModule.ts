// The DICOM Part 10 parser (dicom-parser, a UMD bundle): Vite gives its named exports, Node's ESM
// loader only a default export. One adapter so every caller sees the same functions.
import * as namespace from 'dicom-parser';
import type { DataSet, Element } from 'dicom-parser';

type Parser = typeof namespace;
const parser: Parser = (namespace as unknown as { default?: Parser }).default ?? namespace;

export const parseDicom = parser.parseDicom;
export const readPart10Header = parser.readPart10Header;
export type { DataSet, Element };
