import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { Workspace } from '../workspaces/workspace.entity.js';

export const User = defineEntity({
  name: 'User',
  tableName: 'app_user',
  properties: {
    id: p.integer().primary().autoincrement(),
    email: p.string().length(254).unique(),
    name: p.string().length(120),
    /** argon2id hash (@node-rs/argon2). */
    passwordHash: p.string().length(255).hidden(),
    unitSystem: p.string().length(10).default('us'),
    tempUnit: p.string().length(1).default('F'),
    /** The workspace last chosen (someone in several): a new sign-in works there while they are still a member. */
    lastWorkspaceId: p.integer().nullable(),
    version: p.integer().version(),
    createdAt: p.datetime().onCreate(() => new Date()),
  },
});
export type IUser = InferEntity<typeof User>;

/** A user's role in a workspace. A client member points at their client profile (filled when clients exist). */
export const Membership = defineEntity({
  name: 'Membership',
  tableName: 'membership',
  uniques: [{ properties: ['user', 'workspace'] }],
  properties: {
    id: p.integer().primary().autoincrement(),
    user: () => p.manyToOne(User).ref(),
    workspace: () => p.manyToOne(Workspace).ref(),
    role: p.string().length(20),
    clientId: p.integer().nullable(),
    createdAt: p.datetime().onCreate(() => new Date()),
  },
});
export type IMembership = InferEntity<typeof Membership>;

export const Invitation = defineEntity({
  name: 'Invitation',
  tableName: 'invitation',
  properties: {
    id: p.integer().primary().autoincrement(),
    workspace: () => p.manyToOne(Workspace).ref(),
    email: p.string().length(254),
    role: p.string().length(20),
    clientId: p.integer().nullable(),
    /** sha256 of the token; the token itself is only in the link. */
    tokenHash: p.string().length(64).unique(),
    expiresAt: p.datetime(),
    acceptedAt: p.datetime().nullable(),
    invitedBy: () => p.manyToOne(User).ref(),
    createdAt: p.datetime().onCreate(() => new Date()),
  },
});
export type IInvitation = InferEntity<typeof Invitation>;

export const PasswordReset = defineEntity({
  name: 'PasswordReset',
  tableName: 'password_reset',
  properties: {
    id: p.integer().primary().autoincrement(),
    user: () => p.manyToOne(User).ref(),
    tokenHash: p.string().length(64).unique(),
    expiresAt: p.datetime(),
    usedAt: p.datetime().nullable(),
    createdAt: p.datetime().onCreate(() => new Date()),
  },
});
