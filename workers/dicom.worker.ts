// DICOM import worker: reads a CT series and RT Plan and traces each beam's ray (src/dicom).
import * as Comlink from 'comlink';
import { dicomImportApi } from '../src/dicom/dicomImportApi';

Comlink.expose(dicomImportApi);
