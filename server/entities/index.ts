/** Every entity, listed once; the DataSource and the migrations CLI read this list. Add new entities here. */
import { Study } from './study.ts';
import { StudyShare } from './study-share.ts';
import { Team } from './team.ts';
import { User } from './user.ts';

export { Study, StudyShare, Team, User };
export const entities = [Team, User, Study, StudyShare];
