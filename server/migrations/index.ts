/** Every migration in order. A change to an entity ships with a new file here (never edit a landed one). */
import { Init1764600000000 } from './1764600000000-init.ts';
import { Studies1764600100000 } from './1764600100000-studies.ts';
import { Accounts1764600200000 } from './1764600200000-accounts.ts';
import { Sweeps1764600300000 } from './1764600300000-sweeps.ts';
import { Workspace1764600400000 } from './1764600400000-workspace.ts';
import { Review1764600600000 } from './1764600600000-review.ts';
import { Bench1764600500000 } from './1764600500000-bench.ts';
import { SortIndexes1764600700000 } from './1764600700000-sort-indexes.ts';
import { TargetSheetsAndDevices1796165946128 } from './1796165946128-target-sheets-and-devices.ts';
import { ReviewVerdictsAndJudgedSheet1796166016790 } from './1796166016790-review-verdicts-and-judged-sheet.ts';
import { CostModels1796166102627 } from './1796166102627-cost-models.ts';
import { ElementPatterns1796167137246 } from './1796167137246-element-patterns.ts';
import { GainColumns1796167550244 } from './1796167550244-gain-columns.ts';
import { MailSender1796167449384 } from './1796167449384-mail-sender.ts';
import { DeviceSweeps1796176850077 } from './1796176850077-device-sweeps.ts';

export const migrations = [Init1764600000000, Studies1764600100000, Accounts1764600200000, Sweeps1764600300000, Workspace1764600400000, Bench1764600500000, Review1764600600000, SortIndexes1764600700000, TargetSheetsAndDevices1796165946128, CostModels1796166102627, ReviewVerdictsAndJudgedSheet1796166016790, ElementPatterns1796167137246, MailSender1796167449384, GainColumns1796167550244, DeviceSweeps1796176850077];
