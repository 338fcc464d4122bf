// Every entity the DataSource knows. A new area adds its entities here (and a migration).
import { Group } from './Group';
import { Invitation } from './Invitation';
import { Membership } from './Membership';
import { User } from './User';

export { Group, Invitation, Membership, User };
export const entities = [User, Group, Membership, Invitation];
