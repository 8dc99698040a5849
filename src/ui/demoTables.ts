// The demo water tables shipped with the page (invented 6 MV-like data, bundled as text so the
// page reads nothing at run time): load them into the water-data draft and put them in the case.
import demoTmrCsv from '../../public/tables/demo-6mv-tmr.csv?raw';
import demoScatterCsv from '../../public/tables/demo-6mv-scatter.csv?raw';
import { editCase, setNotice, setWaterSource } from '../state/store';
import {
  checkWaterDraft,
  patchWaterDraft,
  EMPTY_WATER_DRAFT,
  useWaterDraft,
} from '../state/waterDraft';

const TMR_FILE = 'demo-6mv-tmr.csv';
const SCATTER_FILE = 'demo-6mv-scatter.csv';

export function loadDemoTables(): void {
  try {
    patchWaterDraft({
      ...EMPTY_WATER_DRAFT,
      kind: 'tmr',
      fileName: TMR_FILE,
      csv: demoTmrCsv,
      scatterFileName: SCATTER_FILE,
      scatterCsv: demoScatterCsv,
    });
    const check = checkWaterDraft(useWaterDraft.getState());
    if (check.ok) {
      editCase((c) => ({ ...c, waterData: check.waterData }));
      setWaterSource('case');
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
