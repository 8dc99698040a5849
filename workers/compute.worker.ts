// Compute worker: exposes the engine's calculation API over comlink, each call after the generated
// data (kernels, modelled beams) has been fetched from the app's origin.
import * as Comlink from 'comlink';
import { computeApi } from '../src/compute/computeApi';
import { whenReady } from '../src/compute/whenReady';
import { loadGeneratedDataByFetch } from '../src/io/generatedDataFetch';

Comlink.expose(whenReady(computeApi, loadGeneratedDataByFetch()));
