/**
 * All models, their associations, and `getModels()` for the app.
 * `initModels(sequelize)` binds the classes to a connection; calling it again with the same
 * connection does nothing, with another one re-binds them (scripts and tests use that).
 */
import type { Sequelize } from 'sequelize';
import { getSequelize } from '../db/connection';
import { AuditEntry, initAuditEntry } from './auditEntry';
import { Invitation, initInvitation } from './invitation';
import { MailMessage, initMailMessage } from './mailMessage';
import { Membership, initMembership } from './membership';
import { PasswordReset, initPasswordReset } from './passwordReset';
import { Project, initProject } from './project';
import { Run, RunTag, initRun, initRunTag } from './run';
import { Scan, ScanPoint, initScan, initScanPoint } from './scan';
import { SignInAttempt, initSignInAttempt } from './signInAttempt';
import { User, initUser } from './user';
import { Workspace, initWorkspace } from './workspace';

export { AuditEntry, Invitation, MailMessage, Membership, PasswordReset, Project, Run, RunTag, Scan, ScanPoint, SignInAttempt, User, Workspace };
export type { SiteRole } from './user';
export type { WorkspaceRole } from './membership';

const models = { AuditEntry, Invitation, MailMessage, Membership, PasswordReset, Project, Run, RunTag, Scan, ScanPoint, SignInAttempt, User, Workspace };
export type Models = typeof models;

let boundTo: Sequelize | null = null;

function associate(): void {
  User.hasMany(Membership, { foreignKey: 'userId', as: 'memberships' });
  Membership.belongsTo(User, { foreignKey: 'userId', as: 'user' });
  Workspace.hasMany(Membership, { foreignKey: 'workspaceId', as: 'memberships' });
  Membership.belongsTo(Workspace, { foreignKey: 'workspaceId', as: 'workspace' });
  Workspace.belongsTo(User, { foreignKey: 'createdBy', as: 'creator' });

  Workspace.hasMany(Project, { foreignKey: 'workspaceId', as: 'projects' });
  Project.belongsTo(Workspace, { foreignKey: 'workspaceId', as: 'workspace' });
  Project.belongsTo(User, { foreignKey: 'createdBy', as: 'creator' });

  Workspace.hasMany(Invitation, { foreignKey: 'workspaceId', as: 'invitations' });
  Invitation.belongsTo(Workspace, { foreignKey: 'workspaceId', as: 'workspace' });
  Invitation.belongsTo(User, { foreignKey: 'invitedBy', as: 'inviter' });
  Invitation.belongsTo(User, { foreignKey: 'acceptedBy', as: 'acceptor' });

  User.hasMany(PasswordReset, { foreignKey: 'userId', as: 'passwordResets' });
  PasswordReset.belongsTo(User, { foreignKey: 'userId', as: 'user' });

  Workspace.hasMany(Run, { foreignKey: 'workspaceId', as: 'runs' });
  Run.belongsTo(Workspace, { foreignKey: 'workspaceId', as: 'workspace' });
  Run.belongsTo(Project, { foreignKey: 'projectId', as: 'project' });
  Run.belongsTo(User, { foreignKey: 'createdBy', as: 'creator' });
  Run.hasMany(RunTag, { foreignKey: 'runId', as: 'tags' });
  RunTag.belongsTo(Run, { foreignKey: 'runId', as: 'run' });

  Workspace.hasMany(Scan, { foreignKey: 'workspaceId', as: 'scans' });
  Scan.belongsTo(Workspace, { foreignKey: 'workspaceId', as: 'workspace' });
  Scan.belongsTo(Project, { foreignKey: 'projectId', as: 'project' });
  Scan.belongsTo(User, { foreignKey: 'createdBy', as: 'creator' });
  Scan.hasMany(ScanPoint, { foreignKey: 'scanId', as: 'points' });

  AuditEntry.belongsTo(User, { foreignKey: 'actorId', as: 'actor' });
  AuditEntry.belongsTo(Workspace, { foreignKey: 'workspaceId', as: 'workspace' });
}

export function initModels(sequelize: Sequelize): Models {
  if (boundTo === sequelize) return models;
  initUser(sequelize);
  initWorkspace(sequelize);
  initMembership(sequelize);
  initProject(sequelize);
  initInvitation(sequelize);
  initPasswordReset(sequelize);
  initMailMessage(sequelize);
  initAuditEntry(sequelize);
  initSignInAttempt(sequelize);
  initRun(sequelize);
  initRunTag(sequelize);
  initScan(sequelize);
  initScanPoint(sequelize);
  associate();
  boundTo = sequelize;
  return models;
}

/** The models bound to the process's shared connection (initialised on first call). */
export function getModels(): Models {
  return initModels(getSequelize());
}
