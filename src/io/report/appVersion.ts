// The app version printed on every record: the package's own version field.
import { version } from '../../../package.json';

export const APP_VERSION: string = version;
