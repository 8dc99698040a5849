// Every test process reads the generated data from disk once, as the CLI does.
import { loadGeneratedDataFromDisk } from '../../src/io/generatedDataNode';

loadGeneratedDataFromDisk();
