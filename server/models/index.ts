// The model registry: every model is initialised here, then associations are wired once.
import { sequelize } from '../db';
import { CaptureDraft } from './capture-draft';
import { CaptureRevision } from './capture-revision';
import { Job } from './job';
import { Session } from './session';
import { StoredFile } from './stored-file';
import { User } from './user';

User.initModel(sequelize);
Session.initModel(sequelize);
Job.initModel(sequelize);
CaptureDraft.initModel(sequelize);
CaptureRevision.initModel(sequelize);
StoredFile.initModel(sequelize);

Job.belongsTo(User, { as: 'technician', foreignKey: 'technicianId' });
Job.belongsTo(User, { as: 'createdBy', foreignKey: 'createdById' });
Job.hasOne(CaptureDraft, { as: 'draft', foreignKey: 'jobId' });
Job.hasMany(CaptureRevision, { as: 'revisions', foreignKey: 'jobId' });
Job.hasMany(StoredFile, { as: 'files', foreignKey: 'jobId' });

export { sequelize, CaptureDraft, CaptureRevision, Job, Session, StoredFile, User };
