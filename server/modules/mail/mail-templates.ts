import { inReadersScale, type TempScale } from '@shared/domain/temperature.js';

/** E-mail bodies (plain text first, simple HTML second). Every value is escaped in the HTML part. */
export interface MailBody {
  subject: string;
  text: string;
  html: string;
}

/**
 * A body written with "N °F (M °C)" pairs, for a reader of `scale`: each pair °C first for a °C reader (subject,
 * text and HTML alike); other text as it is.
 */
export function forReader(body: MailBody, scale: TempScale): MailBody {
  return { subject: inReadersScale(body.subject, scale), text: inReadersScale(body.text, scale), html: inReadersScale(body.html, scale) };
}

export function escapeHtml(s: string): string {
  return s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);
}

function layout(paragraphs: string[], link?: { href: string; label: string }): string {
  const ps = paragraphs.map((p) => `<p style="margin:0 0 12px">${escapeHtml(p).replace(/\n/g, '<br>')}</p>`).join('');
  const button = link
    ? `<p style="margin:16px 0"><a href="${escapeHtml(link.href)}" style="background:#1f1b16;color:#fff;padding:10px 16px;border-radius:8px;text-decoration:none;font-weight:bold">${escapeHtml(link.label)}</a></p><p style="margin:0 0 12px;font-size:13px;color:#5b544b">Or open this address: ${escapeHtml(link.href)}</p>`
    : '';
  return `<!doctype html><html><body style="font-family:Arial,Helvetica,sans-serif;color:#1f1b16;line-height:1.5;max-width:560px">${ps}${button}<p style="font-size:12px;color:#5b544b">Sent by Trayline.</p></body></html>`;
}

const ROLE_WORDS: Record<string, string> = { assistant: 'kitchen assistant', client: 'client', coach: 'coach' };

export function invitationMail(p: { workspaceName: string; inviterName: string; role: string; link: string; days: number }): MailBody {
  const role = ROLE_WORDS[p.role] ?? p.role;
  const lines = [
    `${p.inviterName} invites you to join ${p.workspaceName} on Trayline as ${role}.`,
    `The link works once and for ${p.days} days.`,
    'If you did not expect this invitation, ignore this e-mail.',
  ];
  return {
    subject: `${p.workspaceName} invites you to Trayline`,
    text: `${lines[0]}\n\nAccept the invitation: ${p.link}\n\n${lines.slice(1).join('\n')}\n`,
    html: layout(lines, { href: p.link, label: 'Accept the invitation' }),
  };
}

export function passwordResetMail(p: { link: string; minutes: number }): MailBody {
  const lines = [
    'Someone (hopefully you) asked to reset the password of this Trayline account.',
    `The link works once and for ${p.minutes} minutes.`,
    'If you did not ask for it, ignore this e-mail: your password stays as it is.',
  ];
  return {
    subject: 'Reset your Trayline password',
    text: `${lines[0]}\n\nChoose a new password: ${p.link}\n\n${lines.slice(1).join('\n')}\n`,
    html: layout(lines, { href: p.link, label: 'Choose a new password' }),
  };
}

/**
 * Sent when an account's password changes (in Settings, or through a reset link), so that a change its owner did not
 * make does not go unnoticed. Holds no secret: the link goes to the page that asks for a reset link.
 */
export function passwordChangedMail(p: { email: string; device: string | null; how: 'settings' | 'reset'; signedOut: number | 'all'; forgotLink: string }): MailBody {
  // "A browser that did not say which" reads on in lower case; a browser's name keeps its capital.
  const from = p.device ? ` from ${p.device.replace(/^A /, 'a ')}` : '';
  const how = p.how === 'settings' ? `in Settings${from}` : 'with a reset link sent to this address';
  const out =
    p.signedOut === 'all'
      ? 'Every device that was signed in has been signed out.'
      : p.signedOut === 0
        ? 'No other device was signed in.'
        : `${p.signedOut === 1 ? 'The other device' : `The ${p.signedOut} other devices`} signed in as you ${p.signedOut === 1 ? 'was' : 'were'} signed out.`;
  const lines = [
    `The password of your Trayline account (${p.email}) was just changed ${how}.`,
    out,
    'If this was you, there is nothing to do. If it was not, choose a new password at once with the link below, and tell your coach.',
  ];
  return {
    subject: 'Your Trayline password was changed',
    text: `${lines.join('\n\n')}\n\nChoose a new password: ${p.forgotLink}\n`,
    html: layout(lines, { href: p.forgotLink, label: 'Choose a new password' }),
  };
}

/** A client's week (the PDF is attached by the job). `note` is the coach's personal note. */
export function weekPlanMail(p: {
  businessName: string;
  clientName: string;
  weekLabel: string;
  note?: string | null;
  link?: string;
  /** A calendar file of thaw reminders goes along (the week has a frozen plate). */
  thawReminders?: boolean;
  /** How many of the plan's plates hold an allergen on the client's list (the PDF says which and what to do). */
  allergenPlates?: number;
  /**
   * Sent once the week has begun: how many of those plates are dated from `day` on ("Friday, Dec 4"), when some
   * are behind.
   */
  allergenPlatesAhead?: { count: number; day: string };
}): MailBody {
  const lines = [
    `Hello ${p.clientName},`,
    `your plan for the week of ${p.weekLabel} is attached as a PDF: each day's plate, how to put it together and reheat it, the macros and the eat-by dates.`,
    ...allergenLine(p.allergenPlates ?? 0, p.allergenPlatesAhead),
    ...(p.thawReminders
      ? ['Some plates come frozen: the calendar file attached reminds you on the evening before to move each one from the freezer to the fridge. Open it to add the reminders to your calendar.']
      : []),
    ...(p.note ? [`A note from ${p.businessName}:\n${p.note}`] : []),
  ];
  return {
    subject: `${p.businessName}: your plates for the week of ${p.weekLabel}`,
    text: `${lines.join('\n\n')}${p.link ? `\n\nSee it on your phone: ${p.link}` : ''}\n`,
    html: layout(lines, p.link ? { href: p.link, label: 'Open my plates' } : undefined),
  };
}

/** The plan e-mail's sentence on plates holding an allergen on the client's list (none when there is none). */
function allergenLine(n: number, ahead?: { count: number; day: string }): string[] {
  if (n <= 0) return [];
  const plates = (k: number) => (k === 1 ? 'One plate' : `${k} plates`);
  if (!ahead || ahead.count >= n) {
    return [`${plates(n)} ${n === 1 ? 'holds' : 'hold'} an allergen on your list: the PDF says which, and what to do, beside ${n === 1 ? 'it' : 'each'}.`];
  }
  if (ahead.count === 0) {
    return [`${plates(n)} earlier this week held an allergen on your list, none from ${ahead.day} on: the PDF says which.`];
  }
  return [`${plates(n)} this week hold an allergen on your list, ${ahead.count} of them from ${ahead.day} on: the PDF says which, and what to do, beside each.`];
}

/** To a kitchen assistant: a prep day's shopping list and bake run, attached as PDFs. */
/** `name` and `link` are absent for an address that has no account (a kitchen's shared inbox). */
export function prepDayMail(p: { businessName: string; name?: string | null; prepLabel: string; weekName: string; note?: string | null; link?: string }): MailBody {
  const lines = [
    p.name ? `Hello ${p.name},` : 'Hello,',
    `the shopping list and the bake run for prep day ${p.prepLabel} (${p.weekName}) are attached as PDFs. They show the plan as it is when this e-mail leaves${p.link ? '; Trayline always has the latest' : ''}.`,
    ...(p.note ? [`A note from ${p.businessName}:\n${p.note}`] : []),
  ];
  return {
    subject: `${p.businessName}: prep day ${p.prepLabel}, shopping list and bake run`,
    text: `${lines.join('\n\n')}${p.link ? `\n\nOpen the shopping list: ${p.link}` : ''}\n`,
    html: layout(lines, p.link ? { href: p.link, label: 'Open the shopping list' } : undefined),
  };
}

/**
 * To a coach: a tray of a prep day was written down as thrown away in the cooling record. Its portions no longer
 * count as baked; the coach decides whether to bake it again or change the plates that needed it.
 */
export function trayThrownAwayMail(p: {
  businessName: string;
  name: string;
  trayName: string;
  prepLabel: string;
  weekName: string;
  recordedBy: string;
  /** "08:33", and "10:50" when it was reheated and cooled again from then. */
  outAt: string;
  restartedAt?: string | null;
  /** "10:45 75 °F (24 °C)", in the order taken. */
  readings: string[];
  /** Where it stood on its readings when thrown away (the cooling check's words), if anything is to be said. */
  standing?: string | null;
  note?: string | null;
  link: string;
}): MailBody {
  const lines = [
    `Hello ${p.name},`,
    `${p.recordedBy} wrote down ${p.trayName} as thrown away on prep day ${p.prepLabel} (${p.weekName}). It came out at ${p.outAt}${
      p.restartedAt ? `, was reheated and cooled again from ${p.restartedAt}` : ''
    }.`,
    p.readings.length ? `Temperatures written down: ${p.readings.join('; ')}.` : 'No temperature was written down for it.',
    ...(p.standing ? [p.standing] : []),
    ...(p.note ? [`Note in the cooling record:\n${p.note}`] : []),
    'Its portions no longer count as baked: the week board shows what is now short, and "Set tray counts to cover the need" adds a tray for it. Bake it again, or change the plates that needed it.',
  ];
  return {
    subject: `${p.businessName}: ${p.trayName} thrown away on prep day ${p.prepLabel}`,
    text: `${lines.join('\n\n')}\n\nOpen the week board: ${p.link}\n`,
    html: layout(lines, { href: p.link, label: 'Open the week board' }),
  };
}

/**
 * To each coach and kitchen assistant: a tray's cooling record passed a Food Code deadline with no reading showing
 * the stage met (sent by the cooling watch, in the kitchen's time zone).
 */
export function coolingMissedMail(p: {
  businessName: string;
  name: string;
  trayName: string;
  prepLabel: string;
  weekName: string;
  /** "70 °F (21 °C)" or "41 °F (5 °C)". */
  stage: string;
  /** The deadline missed, "10:35". */
  deadline: string;
  /** "08:33", and "10:50" when cooling started again after a reheat. */
  outAt: string;
  restartedAt?: string | null;
  readings: string[];
  /** What to do (the cooling check's words). */
  said: string;
  link: string;
}): MailBody {
  const lines = [
    `Hello ${p.name},`,
    `${p.trayName} (prep day ${p.prepLabel}, ${p.weekName}) had to be at ${p.stage} or below by ${p.deadline}, and no temperature written down in its cooling record shows it was. It came out at ${p.outAt}${
      p.restartedAt ? `, was reheated and cooled again from ${p.restartedAt}` : ''
    }.`,
    p.readings.length ? `Temperatures written down: ${p.readings.join('; ')}.` : 'No temperature was written down for it.',
    p.said,
    `If it was at ${p.stage} or below in time and the reading is only missing from the record, write it down there with the time it was taken. Until then, keep its portions apart and do not serve them.`,
    'This is common practice for cooling logs; your local food code and inspector decide what to do.',
  ];
  return {
    subject: `${p.businessName}: ${p.trayName} missed its cooling deadline: ${p.stage} by ${p.deadline}`,
    text: `${lines.join('\n\n')}\n\nOpen the cooling record: ${p.link}\n`,
    html: layout(lines, { href: p.link, label: 'Open the cooling record' }),
  };
}

/**
 * To each coach and kitchen assistant: a prep day under way (some of its trays written down in the cooling record)
 * has a tray planned out a while ago that the record does not have (sent by the cooling watch).
 */
export function coolingNotWrittenMail(p: {
  businessName: string;
  name: string;
  trayName: string;
  prepLabel: string;
  weekName: string;
  /** Its planned time out, "10:31". */
  plannedOut: string;
  /** How long ago, "35 min". */
  late: string;
  link: string;
}): MailBody {
  const lines = [
    `Hello ${p.name},`,
    `${p.trayName} (prep day ${p.prepLabel}, ${p.weekName}) was planned out of the oven at ${p.plannedOut}, ${p.late} ago, and its cooling record does not have it yet.`,
    'If it is out, write down when it came out: its cooling deadlines (70 °F (21 °C) within 2 hours, 41 °F (5 °C) within 6 hours in total, FDA Food Code §3-501.14) count from then.',
    'If it is still in the oven, write it down when it comes out. If the day started later than planned, "Started at another time" on the bake-run page moves the plan.',
  ];
  return {
    subject: `${p.businessName}: ${p.trayName} is not in the cooling record (planned out ${p.plannedOut})`,
    text: `${lines.join('\n\n')}\n\nOpen the cooling record: ${p.link}\n`,
    html: layout(lines, { href: p.link, label: 'Open the cooling record' }),
  };
}

/** To a coach: a tray written down as thrown away was marked as kept after all (its portions count again). */
export function trayKeptMail(p: { businessName: string; name: string; trayName: string; prepLabel: string; weekName: string; recordedBy: string; link: string }): MailBody {
  const lines = [
    `Hello ${p.name},`,
    `${p.recordedBy} changed the cooling record: ${p.trayName} of prep day ${p.prepLabel} (${p.weekName}) is not thrown away after all.`,
    'Its portions count as baked again. If you already added a tray or changed plates for it, check the week board.',
  ];
  return {
    subject: `${p.businessName}: ${p.trayName} not thrown away after all (prep day ${p.prepLabel})`,
    text: `${lines.join('\n\n')}\n\nOpen the week board: ${p.link}\n`,
    html: layout(lines, { href: p.link, label: 'Open the week board' }),
  };
}
