import { isApiError } from '@/lib/api-client';

/**
 * The one place that turns the server's stable error codes into words a person understands.
 * `useServerMessage` marks codes whose server message is already written for people and says
 * more than we could here (how long to wait, which rule a password broke).
 */
const words: Record<string, { text: string; useServerMessage?: boolean }> = {
  invalid_credentials: { text: 'That e-mail address and password do not match an account. Check both and try again.' },
  too_many_requests: { text: 'Too many attempts in a short time. Wait a few minutes and try again.', useServerMessage: true },
  unauthenticated: { text: 'Your session has ended. Sign in again to continue.' },
  forbidden: { text: 'Your account does not have permission to do that.' },
  csrf_header_missing: { text: 'The request was refused for safety. Reload the page and try again.' },
  not_found: { text: 'We could not find that. It may have been removed, or the link is wrong.' },
  link_invalid: { text: 'This link is not valid any more: it was already used or it has expired.' },
  wrong_password: { text: 'Your current password is not right.' },
  weak_password: { text: 'Choose a stronger password.', useServerMessage: true },
  email_taken: { text: 'Someone already has an account with that e-mail address.' },
  already_active: { text: 'This person has already set a password, so there is no invitation to send.' },
  cannot_change_self: { text: 'You cannot disable your own account or take away your own admin role.' },
  validation_failed: { text: 'Some fields need attention. Check the highlighted fields.', useServerMessage: true },
  bad_cursor: { text: 'The list changed while you were paging through it. Start again from the top.' },
  malformed_json: { text: 'The request could not be read. Reload the page and try again.' },
  payload_too_large: { text: 'That is more than can be sent at once.' },
  file_too_large: { text: 'The file is larger than the upload limit.' },
  internal_error: { text: 'Something went wrong on our side. Try again in a moment.' },
  nothing_to_change: { text: 'Nothing was changed, so there was nothing to save.' },
  unsupported_charset: { text: 'The request could not be read. Reload the page and try again.' },
  unsupported_encoding: { text: 'The request could not be read. Reload the page and try again.' },
  malformed_body: { text: 'The request could not be read. Reload the page and try again.' },
  malformed_upload: { text: 'The file did not arrive whole. Choose it again and retry.' },
  too_many_files: { text: 'Send one file at a time.' },
  unexpected_file_field: { text: 'The file could not be attached. Reload the page and try again.' },
  too_many_fields: { text: 'The upload has more parts than it may have. Reload the page and try again.' },
  field_too_large: { text: 'A field of the upload is too long.' },
  // Outages: a service Gridkeep depends on is down; nothing was saved, and trying again later is safe.
  database_unavailable: { text: 'Gridkeep cannot reach its database right now, so nothing was saved. Try again in a minute.' },
  storage_unavailable: { text: 'File storage is not answering, so the file was not saved. Try again in a minute.' },
  // Field work: the server's message names the cabinet, the position, the visit or the stock.
  cabinet_moved: {
    text: 'The cabinet has moved since the repair was logged. Check the wall map and log it again.',
    useServerMessage: true,
  },
  not_installed: { text: 'That cabinet is not on a wall any more.', useServerMessage: true },
  visit_closed: { text: 'That visit is already closed or cancelled.', useServerMessage: true },
  not_on_visit: { text: 'You are not one of the technicians of that visit. Ask the office to add you.', useServerMessage: true },
  not_a_spare: { text: 'That cabinet is not a spare in stock.', useServerMessage: true },
  spare_not_at_hand: { text: 'That spare cabinet is not in a van or a site kit.', useServerMessage: true },
  model_mismatch: { text: 'That spare is another cabinet model than the wall’s.', useServerMessage: true },
  stock_not_yours: { text: 'That stock is not in your van or a site kit you are working at.', useServerMessage: true },
  idempotency_key_reused: { text: 'This repair was already sent with other details. Discard it and log it again.' },
  network_error: { text: 'Gridkeep could not be reached. Check your connection and try again.' },
  unexpected_response: { text: 'The server answered in a way we did not expect. Try again in a moment.' },
};

const byStatus: Record<number, string> = {
  401: words.unauthenticated.text,
  403: words.forbidden.text,
  404: words.not_found.text,
  429: words.too_many_requests.text,
  502: 'Gridkeep is restarting or unreachable. Try again in a moment.',
  503: 'Gridkeep is busy or being updated. Try again in a moment.',
};

/** Words for any error thrown by an API call (or anything else). */
export function errorMessage(error: unknown): string {
  if (isApiError(error)) {
    const entry = words[error.code];
    if (entry) return entry.useServerMessage && error.message ? error.message : entry.text;
    return byStatus[error.status] ?? (error.message || words.internal_error.text);
  }
  return 'Something went wrong. Try again, and reload the page if it keeps happening.';
}

/** True when the caller is not (or no longer) signed in: the app sends them to sign-in. */
export function isSignedOut(error: unknown): boolean {
  return isApiError(error) && error.status === 401 && error.code !== 'invalid_credentials';
}

export function isNotFound(error: unknown): boolean {
  return isApiError(error) && error.status === 404;
}
