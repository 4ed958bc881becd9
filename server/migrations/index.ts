/** Every migration in order. A change to an entity ships with a new file here (never edit a landed one). */
import { Init1764600000000 } from './1764600000000-init.ts';
import { Studies1764600100000 } from './1764600100000-studies.ts';
import { Accounts1764600200000 } from './1764600200000-accounts.ts';
import { Sweeps1764600300000 } from './1764600300000-sweeps.ts';
import { Workspace1764600400000 } from './1764600400000-workspace.ts';
import { Review1764600600000 } from './1764600600000-review.ts';
import { Bench1764600500000 } from './1764600500000-bench.ts';
import { SortIndexes1764600700000 } from './1764600700000-sort-indexes.ts';
import { CostModels1796166102627 } from './1796166102627-cost-models.ts';

export const migrations = [Init1764600000000, Studies1764600100000, Accounts1764600200000, Sweeps1764600300000, Workspace1764600400000, Bench1764600500000, Review1764600600000, SortIndexes1764600700000, CostModels1796166102627];
