// Loads the generated data in a page worker: fetched from the app's own origin (the assets Vite
// emitted beside the worker script; no request leaves the origin), decoded and installed.
import { installGeneratedData } from '../engine/data/generatedData';
import {
  decodeGeneratedData,
  GENERATED_FILE_URLS,
  type GeneratedFileName,
} from './generatedDataFiles';

async function fetchBytes(url: URL): Promise<Uint8Array> {
  const res = await fetch(url);
  if (!res.ok) throw new Error(`generated data ${url.pathname}: HTTP ${res.status}`);
  return new Uint8Array(await res.arrayBuffer());
}

/** Fetches, decodes and installs every generated file; rejects naming the file that failed. */
export async function loadGeneratedDataByFetch(): Promise<void> {
  const names = Object.keys(GENERATED_FILE_URLS) as GeneratedFileName[];
  const fetched = new Map(
    await Promise.all(
      names.map(async (n) => [n, await fetchBytes(GENERATED_FILE_URLS[n])] as const),
    ),
  );
  installGeneratedData(decodeGeneratedData((n) => fetched.get(n) as Uint8Array));
}
