// Files from a drop (folders walked through the entries API) or a file input, each named by its
// path in the dropped folder.
import type { NamedBlob } from '../../dicom/dicomImportApi';

function readAll(reader: FileSystemDirectoryReader): Promise<FileSystemEntry[]> {
  return new Promise((resolve, reject) => {
    const out: FileSystemEntry[] = [];
    const next = () =>
      reader.readEntries((batch) => {
        if (batch.length === 0) resolve(out);
        else {
          out.push(...batch);
          next();
        }
      }, reject);
    next();
  });
}

async function walk(entry: FileSystemEntry, out: NamedBlob[]): Promise<void> {
  if (entry.isFile) {
    const file = await new Promise<File>((resolve, reject) =>
      (entry as FileSystemFileEntry).file(resolve, reject),
    );
    out.push({ name: entry.fullPath.replace(/^\//, ''), blob: file });
  } else if (entry.isDirectory) {
    for (const e of await readAll((entry as FileSystemDirectoryEntry).createReader()))
      await walk(e, out);
  }
}

export async function filesFromDrop(dt: DataTransfer): Promise<NamedBlob[]> {
  const entries = Array.from(dt.items)
    .map((i) => (typeof i.webkitGetAsEntry === 'function' ? i.webkitGetAsEntry() : null))
    .filter((e): e is FileSystemEntry => e !== null);
  if (entries.length === 0) return filesFromList(dt.files);
  const out: NamedBlob[] = [];
  for (const e of entries) await walk(e, out);
  return out;
}

export function filesFromList(list: FileList | null): NamedBlob[] {
  return Array.from(list ?? []).map((f) => ({ name: f.webkitRelativePath || f.name, blob: f }));
}
