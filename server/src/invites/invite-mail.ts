import { type MailBlock, type RenderedMail, renderMail } from '../mail/mail-layout';

/** What a role means, in the invite's words. */
export const roleMeaning: Record<'partner' | 'viewer', string> = {
  partner: 'As a partner you add your own devices, share gear from your locker with the party and run the plan.',
  viewer:
    'As a viewer you can read the trip and its plan; nothing you do changes it. The leader may send you the plan before the party leaves.',
};

export interface InviteMailInput {
  tripName: string;
  inviterName: string;
  role: 'partner' | 'viewer';
  /** The whole accept link, with the token. */
  link: string;
  expiresAt: Date;
}

/** Subject, text and HTML of an invite e-mail. */
export function inviteMail(input: InviteMailInput): RenderedMail & { subject: string } {
  const subject = `${input.inviterName} invited you to "${input.tripName}" on Gramwatt`;
  const expires = input.expiresAt.toISOString().slice(0, 16).replace('T', ' ');
  const blocks: MailBlock[] = [
    {
      type: 'paragraph',
      text: `${input.inviterName} is planning "${input.tripName}" and asked you to join as a ${input.role}.`,
    },
    { type: 'paragraph', text: roleMeaning[input.role] },
    { type: 'link', label: 'Open the invite', url: input.link },
    {
      type: 'paragraph',
      text: `Sign in or make an account with this e-mail address to accept. The link works once and until ${expires} UTC.`,
    },
    { type: 'paragraph', text: 'Not expecting this? Ignore it: nothing happens unless you accept.' },
  ];
  return {
    subject,
    ...renderMail(
      subject,
      blocks,
      'Gramwatt plans the power gear a party carries. This message was sent because a trip leader entered your address.',
    ),
  };
}
