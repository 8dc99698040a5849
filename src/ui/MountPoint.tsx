// Panels other parts of Lamina add later. Each is found at build time if its file exists (Vite
// glob import), so this page never imports a file that is not there.
import { lazy, Suspense, type ComponentType } from 'react';

type PanelModule = Record<string, unknown>;

const modules = import.meta.glob<PanelModule>([
  './check/CheckPanel.tsx',
  './plane/DosePlanePanel.tsx',
  './montecarlo/MonteCarloPanel.tsx',
  './dicom/DicomImportPanel.tsx',
  './explain/ExplainPanel.tsx',
]);

function lazyPanel(path: string, exportName: string): ComponentType | null {
  const load = modules[path];
  if (!load) return null;
  return lazy(async () => {
    const m = await load();
    const comp = (m[exportName] ?? m.default) as ComponentType | undefined;
    return { default: comp ?? (() => <p className="empty">This panel did not load.</p>) };
  });
}

const PANELS = {
  check: lazyPanel('./check/CheckPanel.tsx', 'CheckPanel'),
  plane: lazyPanel('./plane/DosePlanePanel.tsx', 'DosePlanePanel'),
  mc: lazyPanel('./montecarlo/MonteCarloPanel.tsx', 'MonteCarloPanel'),
  dicom: lazyPanel('./dicom/DicomImportPanel.tsx', 'DicomImportPanel'),
  explain: lazyPanel('./explain/ExplainPanel.tsx', 'ExplainPanel'),
} as const;

export function MountPoint({
  which,
  title,
  pending,
}: {
  which: keyof typeof PANELS;
  title: string;
  pending: string;
}) {
  const Panel = PANELS[which];
  if (!Panel)
    return (
      <div className="mount-empty" data-testid={`mount-${which}`}>
        <h2>{title}</h2>
        <p>{pending}</p>
      </div>
    );
  return (
    <Suspense fallback={<p className="empty">Loading {title}…</p>}>
      <Panel />
    </Suspense>
  );
}
