/**
 * The e-mails Pinwright sends, each as plain text and simple HTML in our own
 * words. Every value put into the HTML is escaped.
 *
 * Example: resetMessage({ name: 'Marit', link: 'https://…/reset-password?token=…' }).subject
 *   → 'Reset your Pinwright password'
 */

export type MailBody = { subject: string; text: string; html: string };

/** Escapes text for HTML element content and quoted attribute values. */
export function escapeHtml(value: string): string {
  return value.replace(/[&<>"']/g, (ch) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[ch]!);
}

function page(title: string, paragraphs: string[], action?: { label: string; href: string }, footer?: string): string {
  const body = paragraphs.map((p) => `<p style="margin:0 0 16px">${p}</p>`).join('\n');
  const button = action
    ? `<p style="margin:24px 0"><a href="${escapeHtml(action.href)}" style="background:#A9420E;color:#FFFCF7;padding:12px 20px;border-radius:8px;text-decoration:none;font-weight:bold">${escapeHtml(action.label)}</a></p>
<p style="margin:0 0 16px;font-size:14px;color:#4F5B66">If the button does not work, copy this address into your browser:<br>${escapeHtml(action.href)}</p>`
    : '';
  const foot = footer ? `<p style="margin:32px 0 0;font-size:13px;color:#4F5B66">${footer}</p>` : '';
  return `<!doctype html>
<html><head><meta charset="utf-8"><title>${escapeHtml(title)}</title></head>
<body style="margin:0;padding:24px;background:#F3EEE4;color:#1E262E;font-family:system-ui,sans-serif;font-size:16px;line-height:1.5">
<div style="max-width:560px;margin:0 auto;background:#FFFCF7;padding:24px;border-radius:12px">
<h1 style="font-size:22px;margin:0 0 16px">${escapeHtml(title)}</h1>
${body}
${button}
${foot}
</div></body></html>`;
}

/** An archer invites a technician to one bow. */
export function inviteMessage({
  archerName,
  bowNickname,
  link,
  expiresAt,
}: {
  archerName: string;
  bowNickname: string;
  link: string;
  expiresAt: Date;
}): MailBody {
  const until = expiresAt.toISOString().slice(0, 10);
  const subject = `${archerName} shared a bow with you on Pinwright`;
  const text = [
    `Hello,`,
    ``,
    `${archerName} uses Pinwright to keep the records of their bow "${bowNickname}" and would like you to see them: the set-up, arrow builds, sight-ins and level checks. You will be able to add sight-ins, marks, level checks and notes; you will not be able to delete anything.`,
    ``,
    `To accept, open this link and sign in with your technician account, or create one:`,
    link,
    ``,
    `The link works once and until ${until}. If you were not expecting this, ignore this message: nothing is shared until you accept.`,
    ``,
    `Pinwright`,
  ].join('\n');
  const html = page(
    'A bow was shared with you',
    [
      `${escapeHtml(archerName)} uses Pinwright to keep the records of their bow <strong>${escapeHtml(bowNickname)}</strong> and would like you to see them: the set-up, arrow builds, sight-ins and level checks.`,
      `You will be able to add sight-ins, marks, level checks and notes; you will not be able to delete anything.`,
      `To accept, open the link and sign in with your technician account, or create one.`,
    ],
    { label: 'See the invitation', href: link },
    `The link works once and until ${escapeHtml(until)}. If you were not expecting this, ignore this message: nothing is shared until you accept.`,
  );
  return { subject, text, html };
}

/** A password reset link. */
export function resetMessage({ name, link }: { name: string; link: string }): MailBody {
  const subject = 'Reset your Pinwright password';
  const text = [
    `Hello ${name},`,
    ``,
    `Someone (we hope you) asked to reset the password of your Pinwright account. To choose a new password, open this link:`,
    link,
    ``,
    `The link works once, for one hour. Choosing a new password signs you out everywhere you are signed in.`,
    `If you did not ask for this, ignore this message: your password stays as it is.`,
    ``,
    `Pinwright`,
  ].join('\n');
  const html = page(
    'Reset your password',
    [
      `Hello ${escapeHtml(name)},`,
      `Someone (we hope you) asked to reset the password of your Pinwright account. To choose a new password, open the link.`,
    ],
    { label: 'Choose a new password', href: link },
    `The link works once, for one hour. Choosing a new password signs you out everywhere you are signed in. If you did not ask for this, ignore this message: your password stays as it is.`,
  );
  return { subject, text, html };
}

/** A sight tape's print sheet sent as a PDF attachment. */
export function tapeMessage({
  senderName,
  bowNickname,
  sightInDate,
  filename,
}: {
  senderName: string;
  bowNickname: string;
  sightInDate: string;
  filename: string;
}): MailBody {
  const subject = `Sight tape for ${bowNickname} (${sightInDate})`;
  const caution = 'A printed tape is an estimate until every distance you will shoot has been confirmed at the range.';
  const text = [
    `Hello,`,
    ``,
    `${senderName} sent you the print sheet of a sight tape for the bow "${bowNickname}", from the sight-in of ${sightInDate}. It is attached as ${filename}.`,
    ``,
    `Print it at 100 % (actual size, no "fit to page") and measure the 50 mm bar on the sheet with a ruler before you cut the tape.`,
    caution,
    ``,
    `Pinwright`,
  ].join('\n');
  const html = page('A sight tape for you', [
    `${escapeHtml(senderName)} sent you the print sheet of a sight tape for the bow <strong>${escapeHtml(bowNickname)}</strong>, from the sight-in of ${escapeHtml(sightInDate)}. It is attached as ${escapeHtml(filename)}.`,
    `Print it at 100 % (actual size, no “fit to page”) and measure the 50 mm bar on the sheet with a ruler before you cut the tape.`,
    `<strong>Caution:</strong> ${escapeHtml(caution)}`,
  ]);
  return { subject, text, html };
}
