import type { OutgoingMail } from '../mail/mailer';

/** The note to an account's owner when strangers have been stopped from guessing their password. */
export function strangerSignInMail(f: { to: string; name: string; failures: number; minutes: number }): OutgoingMail {
  const text = [
    `Hello ${f.name},`,
    '',
    `someone tried to sign in to your Dilato account ${f.failures} times with a wrong password, from an address you have not signed in from before.`,
    `Dilato has stopped taking sign-ins for your account from there for ${f.minutes} minutes.`,
    '',
    'You can still sign in as usual from the devices and places you have used before.',
    'If this was you (a new computer, or away from the shop), wait and try again, or ask an admin to set a new password.',
    'If it was not you, nothing else is needed: the password was never accepted.',
  ].join('\n');
  const html = text
    .split('\n\n')
    .map((p) => `<p>${p.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`).replace(/\n/g, '<br>')}</p>`)
    .join('\n');
  return { to: f.to, subject: 'Failed sign-ins to your Dilato account', text, html };
}
