// Every entity the DataSource knows. A new area adds its entities here (and a migration).
import { Group } from './Group';
import { Attachment, AttachmentUploader } from './Attachment';
import { Invitation } from './Invitation';
import { Membership } from './Membership';
import { Sketch } from './Sketch';
import { SyncChange } from './SyncChange';
import { SyncConflict } from './SyncConflict';
import { SyncMutation } from './SyncMutation';
import { User } from './User';

export { Group, Invitation, Membership, User };
export { Attachment, AttachmentUploader, Sketch, SyncChange, SyncConflict, SyncMutation };
export const entities = [User, Group, Membership, Invitation, Sketch, SyncChange, SyncConflict, SyncMutation, Attachment, AttachmentUploader];
