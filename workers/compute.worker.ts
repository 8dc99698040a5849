// Compute worker: exposes the engine's calculation API over comlink.
import * as Comlink from 'comlink';
import { computeApi } from '../src/compute/computeApi';

Comlink.expose(computeApi);
