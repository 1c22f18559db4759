// The model registry: every model is initialised here, then associations are wired once.
import { sequelize } from '../db';
import { AuditEvent } from './audit-event';
import { CaptureDraft } from './capture-draft';
import { CaptureRevision } from './capture-revision';
import { Delivery } from './delivery';
import { Job } from './job';
import { Notification, NotificationPref } from './notification';
import { OutboxMessage } from './outbox-message';
import { PasswordToken } from './password-token';
import { Review } from './review';
import { ReviewDraft } from './review-draft';
import { ReviewScore } from './review-score';
import { ReworkItem } from './rework-item';
import { RiskModel } from './risk-model';
import { Rubric } from './rubric';
import { SecondReview } from './second-review';
import { Session } from './session';
import { ShareLink } from './share-link';
import { StoredFile } from './stored-file';
import { User } from './user';
import { CameraClassSetting, VisitPlanRow } from './visit-plan';

User.initModel(sequelize);
Session.initModel(sequelize);
Job.initModel(sequelize);
CaptureDraft.initModel(sequelize);
CaptureRevision.initModel(sequelize);
StoredFile.initModel(sequelize);
Rubric.initModel(sequelize);
Review.initModel(sequelize);
ReviewScore.initModel(sequelize);
ReviewDraft.initModel(sequelize);
ReworkItem.initModel(sequelize);
SecondReview.initModel(sequelize);
AuditEvent.initModel(sequelize);
OutboxMessage.initModel(sequelize);
PasswordToken.initModel(sequelize);
ShareLink.initModel(sequelize);
Delivery.initModel(sequelize);
Notification.initModel(sequelize);
NotificationPref.initModel(sequelize);
VisitPlanRow.initModel(sequelize);
CameraClassSetting.initModel(sequelize);
RiskModel.initModel(sequelize);

Job.belongsTo(User, { as: 'technician', foreignKey: 'technicianId' });
Job.belongsTo(User, { as: 'createdBy', foreignKey: 'createdById' });
Job.hasOne(CaptureDraft, { as: 'draft', foreignKey: 'jobId' });
Job.hasMany(CaptureRevision, { as: 'revisions', foreignKey: 'jobId' });
Job.hasMany(StoredFile, { as: 'files', foreignKey: 'jobId' });
Job.belongsTo(User, { as: 'claimedBy', foreignKey: 'claimedById' });
Review.belongsTo(User, { as: 'reviewer', foreignKey: 'reviewerId' });
Review.belongsTo(Rubric, { as: 'rubric', foreignKey: 'rubricId' });
Review.hasMany(ReviewScore, { as: 'scores', foreignKey: 'reviewId' });
Review.hasMany(ReworkItem, { as: 'reworkItems', foreignKey: 'reviewId' });
AuditEvent.belongsTo(User, { as: 'actor', foreignKey: 'actorId' });

export {
  AuditEvent,
  CameraClassSetting,
  CaptureDraft,
  CaptureRevision,
  Delivery,
  Job,
  Notification,
  NotificationPref,
  OutboxMessage,
  PasswordToken,
  Review,
  ReviewDraft,
  ReviewScore,
  ReworkItem,
  RiskModel,
  Rubric,
  SecondReview,
  sequelize,
  Session,
  ShareLink,
  StoredFile,
  User,
  VisitPlanRow,
};
