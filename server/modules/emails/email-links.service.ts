import type { LinkKind } from './emails.model';

/**
 * Stored e-mails carry this marker where their sign-in or report link goes. The link itself is made
 * only when the message is sent, from a key that is not in the database, so a copy of the emails
 * table (or a manager reading it) holds no live credential.
 */
export const LINK_MARK = '{{link}}';

/** The link can no longer be made (invitation replaced, report corrected or expired): do not send. */
export class LinkUnavailable extends Error {
  constructor(reason: string) {
    super(reason);
    this.name = 'LinkUnavailable';
  }
}

/** Makes the absolute URL for one row of its kind, or throws LinkUnavailable. */
export type LinkRenderer = (ref: number) => Promise<string>;

const renderers = new Map<LinkKind, LinkRenderer>();

/** The reports and invitation modules register how their links are made when the app is built. */
export function registerLinkRenderer(kind: LinkKind, render: LinkRenderer): void {
  renderers.set(kind, render);
}

const escapeHtml = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

/** The message as it goes out: the marker replaced by the link, escaped for the HTML part. */
export async function renderLinks(email: { linkKind: LinkKind | null; linkRef: number | null; html: string; text: string }): Promise<{ html: string; text: string }> {
  if (!email.linkKind || email.linkRef === null) return { html: email.html, text: email.text };
  const render = renderers.get(email.linkKind);
  if (!render) throw new Error(`no link renderer for ${email.linkKind}: build the app with createApp() first`);
  const link = await render(email.linkRef);
  return { html: email.html.replaceAll(LINK_MARK, escapeHtml(link)), text: email.text.replaceAll(LINK_MARK, link) };
}

/** Why the link of this kind and row cannot be made now (said to a person), or null when it can. */
export async function linkRefusal(kind: LinkKind, ref: number): Promise<string | null> {
  const render = renderers.get(kind);
  if (!render) throw new Error(`no link renderer for ${kind}: build the app with createApp() first`);
  try {
    await render(ref);
    return null;
  } catch (err) {
    if (err instanceof LinkUnavailable) return err.message.replace(/^Not sent: /, '').replace(/^./, (c) => c.toUpperCase());
    throw err;
  }
}
