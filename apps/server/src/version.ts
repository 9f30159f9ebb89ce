import { version } from '../package.json';

export const serverVersion: string = version;
