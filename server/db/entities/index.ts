// Every entity the DataSource knows. A new area adds its entities here (and a migration).
import { Group } from './Group';
import { Attachment, AttachmentUploader } from './Attachment';
import { Invitation } from './Invitation';
import { Membership } from './Membership';
import { Run } from './Run';
import { Sketch } from './Sketch';
import { SyncChange } from './SyncChange';
import { SyncConflict } from './SyncConflict';
import { SyncMutation } from './SyncMutation';
import { User } from './User';
import { Comment } from './Comment';
import { Notification } from './Notification';
import { Photo } from './Photo';
import { SketchFork } from './SketchFork';
import { SketchInvariant } from './SketchInvariant';
import { UserActivity } from './UserActivity';
import { UserSettings } from './UserSettings';

export { Group, Invitation, Membership, User };
export { Attachment, AttachmentUploader, Sketch, SyncChange, SyncConflict, SyncMutation };
export { Run };
export { Comment, Notification, Photo, SketchFork, SketchInvariant, UserActivity, UserSettings };
export const entities = [User, Group, Membership, Invitation, Sketch, SyncChange, SyncConflict, SyncMutation, Attachment, AttachmentUploader,
  Comment, Photo, SketchFork, SketchInvariant, Notification, UserSettings, UserActivity, Run];
