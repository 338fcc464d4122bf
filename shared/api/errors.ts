// The one error shape every API route answers with, and the codes it may carry. Clients switch
// on `code` (stable), show `message` (human, may change) and put `fields` beside form inputs.
import { z } from 'zod';

export const errorCodes = [
  'invalid_input', // 400: body, query or params failed validation (see fields)
  'malformed_json', // 400: the body is not JSON
  'unauthorized', // 401: no token, bad token or expired token
  'invalid_credentials', // 401: wrong e-mail or password at sign-in
  'forbidden', // 403: signed in, but the role does not allow it
  'not_found', // 404: no such thing, or not visible to this user
  'email_taken', // 409: register with an e-mail already in use
  'already_member', // 409: accepting an invitation to a group you are in
  'invitation_used', // 409: the invitation link was already accepted
  'last_owner', // 409: the change would leave the group without an owner
  'run_finished', // 409: cancelling a run that has already ended
  'id_taken', // 409: a client-made id (e.g. a comment's) already names another author's or sketch's item
  'invitation_expired', // 410: the invitation link is past its expiry
  'payload_too_large', // 413: body over the size limit
  'unsupported_type', // 415: an upload that is not one of the accepted kinds (checked by content)
  'rate_limited', // 429: too many attempts, try later
  'run_quota', // 429: the person has as many runs queued or running as the server allows each
  'mail_failed', // 502: the e-mail (e.g. an invitation) could not be sent; nothing was kept
  'busy', // 503: a short computation the request needed took longer than the server allows
  'internal', // 500: a bug on our side; details are in the server log only
] as const;

export const ErrorCode = z.enum(errorCodes);
export type ErrorCode = z.infer<typeof ErrorCode>;

export const ApiErrorBody = z.object({
  error: z.object({
    code: ErrorCode,
    message: z.string(),
    /** For invalid_input: field path (dot-joined, e.g. "email") -> first message for it. */
    fields: z.record(z.string(), z.string()).optional(),
  }),
});
export type ApiErrorBody = z.infer<typeof ApiErrorBody>;
