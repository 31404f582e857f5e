// One-time links (invitations, password resets) are useless to keep and dangerous to leak,
// so once a mail is delivered the stored copy loses them.
export const ONE_TIME_LINK_KINDS = new Set(["invitation", "password-reset"]);
export const LINK_REMOVED = "[one-time link removed after sending]";

const ONE_TIME_LINK = /https?:\/\/[^\s"'<>]+?\/(?:invitation|api\/auth\/reset-password|reset-password)\/[^\s"'<>]+/g;

export function redactOneTimeLinks(body: string): string {
  return body.replace(ONE_TIME_LINK, LINK_REMOVED);
}
