/** Every migration in order. A change to an entity ships with a new file here (never edit a landed one). */
import { Init1764600000000 } from './1764600000000-init.ts';
import { Studies1764600100000 } from './1764600100000-studies.ts';

export const migrations = [Init1764600000000, Studies1764600100000];
