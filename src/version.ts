/** Name and version of this software, as package.json states them (the one source of the version). */
import { version } from '../package.json';

export const SOFTWARE = { name: 'Halfwave', version } as const;
