/** Every entity, listed once; the DataSource and the migrations CLI read this list. Add new entities here. */
import { Study } from './study.ts';
import { StudyShare } from './study-share.ts';
import { Team } from './team.ts';
import { User } from './user.ts';
import { accountEntities } from './accounts.ts';
import { Candidate } from './candidate.ts';
import { TargetSheetRow } from './target-sheet.ts';
import { Comment } from './comment.ts';
import { ReviewRequest } from './review-request.ts';
import { Decision } from './decision.ts';
import { Sweep } from './sweep.ts';
import { Calibration } from './calibration.ts';
import { RangeUpload } from './range-upload.ts';
import { StudyCostModel } from './cost-model.ts';
import { ElementPatternRow } from './element-pattern.ts';
import { Device } from './device.ts';

export { Study, StudyShare, Team, User };
export const entities = [Team, User, Study, StudyShare, ...accountEntities, Candidate, TargetSheetRow, Comment, ReviewRequest, Decision, Sweep, Calibration, RangeUpload, StudyCostModel, ElementPatternRow, Device];
