import type { OutgoingMail } from './mail-queue';

/** The words of every e-mail the accounts feature sends; links point at client routes. */
export const accountMails = {
  invitation(to: string, link: string, inviter: string, roles: string[]): OutgoingMail {
    return {
      to,
      subject: 'You are invited to Kelvindex',
      text: `${inviter} invited you to Kelvindex with the role(s): ${roles.join(', ')}.\n\nAccept the invitation and choose a password here (the link works once and expires in 7 days):\n${link}\n\nIf you did not expect this, ignore this message.`,
    };
  },
  passwordReset(to: string, link: string): OutgoingMail {
    return {
      to,
      subject: 'Reset your Kelvindex password',
      text: `Someone asked to reset the Kelvindex password for this address.\n\nChoose a new password here (the link works once and expires in 1 hour):\n${link}\n\nIf it was not you, ignore this message; your password stays as it is.`,
    };
  },
  emailVerification(to: string, link: string): OutgoingMail {
    return {
      to,
      subject: 'Confirm your e-mail address for Kelvindex',
      text: `Confirm that this address is yours (the link works once and expires in 48 hours):\n${link}`,
    };
  },
};
