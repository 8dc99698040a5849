// The demo water tables shipped with the page (invented 6 MV-like data, served from the same
// origin): load them into the water-data draft and put them in the case.
import { editCase, setNotice, setWaterSource } from '../state/store';
import {
  checkWaterDraft,
  patchWaterDraft,
  EMPTY_WATER_DRAFT,
  useWaterDraft,
} from '../state/waterDraft';

const TMR_FILE = 'demo-6mv-tmr.csv';
const SCATTER_FILE = 'demo-6mv-scatter.csv';

async function fetchText(name: string): Promise<string> {
  const r = await fetch(new URL(`tables/${name}`, document.baseURI));
  if (!r.ok) throw new Error(`${name}: HTTP ${r.status}`);
  return r.text();
}

export async function loadDemoTables(): Promise<void> {
  try {
    const [csv, scatterCsv] = await Promise.all([fetchText(TMR_FILE), fetchText(SCATTER_FILE)]);
    patchWaterDraft({
      ...EMPTY_WATER_DRAFT,
      kind: 'tmr',
      fileName: TMR_FILE,
      csv,
      scatterFileName: SCATTER_FILE,
      scatterCsv,
    });
    const check = checkWaterDraft(useWaterDraft.getState());
    if (check.ok) {
      editCase((c) => ({ ...c, waterData: check.waterData }));
      setWaterSource('table');
    } else
      setNotice({ kind: 'error', title: 'The demo table did not load', lines: check.problems });
  } catch (e) {
    setNotice({
      kind: 'error',
      title: 'The demo table did not load',
      lines: [(e as Error).message],
    });
  }
}
