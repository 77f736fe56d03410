import type { MailQueue, OutgoingMail } from './mail-queue';

/** The words of every e-mail the editorial workflow sends; links point at client routes. */

const DECISION_WORDS = {
  approve: 'approved',
  request_changes: 'sent back with a request for changes',
  reject: 'rejected',
} as const;

export interface ProposalRef {
  id: string;
  title: string;
}

export interface WatchedChange {
  /** e.g. "added", "revised", "retired" */
  change: string;
  /** e.g. "ΔfH°(l)" */
  what: string;
  /** e.g. "−302.9 ± 0.5 kJ/mol → −302.6 ± 0.4 kJ/mol" */
  detail: string;
}

export const workflowMails = {
  submitted(to: string, proposal: ProposalRef, author: string, link: string, resubmitted: boolean): OutgoingMail {
    return {
      to,
      subject: `Proposal to review: ${proposal.title}`,
      text: `${author} ${resubmitted ? 'resubmitted' : 'submitted'} the proposal "${proposal.title}" for review.\n\nThe automatic consistency checks have run on every item. Review it here:\n${link}\n\nYou cannot review a proposal you wrote yourself.`,
    };
  },
  decided(to: string, proposal: ProposalRef, reviewer: string, decision: keyof typeof DECISION_WORDS, comment: string, link: string): OutgoingMail {
    const next = decision === 'request_changes'
      ? 'Make the changes, then resubmit the proposal.'
      : decision === 'approve'
        ? 'An editor will add it to the next release.'
        : 'Its workflow has ended.';
    return {
      to,
      subject: `Your proposal was ${DECISION_WORDS[decision]}: ${proposal.title}`,
      text: `${reviewer} ${DECISION_WORDS[decision]} your proposal "${proposal.title}".${comment ? `\n\nTheir comment:\n${comment}` : ''}\n\n${next}\n${link}`,
    };
  },
  withdrawn(to: string, proposal: ProposalRef, author: string, link: string): OutgoingMail {
    return {
      to,
      subject: `Proposal withdrawn: ${proposal.title}`,
      text: `${author} withdrew the proposal "${proposal.title}" that you reviewed or commented on. Nothing more is needed from you.\n${link}`,
    };
  },
  commented(to: string, proposal: ProposalRef, who: string, body: string, link: string): OutgoingMail {
    return {
      to,
      subject: `New comment on: ${proposal.title}`,
      text: `${who} commented on the proposal "${proposal.title}":\n\n${body}\n\n${link}`,
    };
  },
  addedToRelease(to: string, proposal: ProposalRef, label: string, link: string): OutgoingMail {
    return {
      to,
      subject: `Your proposal goes into release ${label}: ${proposal.title}`,
      text: `An editor added your approved proposal "${proposal.title}" to release ${label}, in preparation. It becomes part of the published data when ${label} is published.\n${link}`,
    };
  },
  released(to: string, proposal: ProposalRef, label: string, link: string): OutgoingMail {
    return {
      to,
      subject: `Your proposal is released in ${label}: ${proposal.title}`,
      text: `Release ${label} is published and includes your proposal "${proposal.title}".\n${link}`,
    };
  },
  watchedSpeciesChanged(to: string, label: string, species: { name: string; formula: string; changes: WatchedChange[] }[], link: string): OutgoingMail {
    const blocks = species.map((s) => `${s.name} (${s.formula})\n${s.changes.map((c) => `  - ${c.what} ${c.change}: ${c.detail}`).join('\n')}`);
    return {
      to,
      subject: `Release ${label} changes species you watch`,
      text: `Release ${label} of Kelvindex is published. It changes data of ${species.length === 1 ? 'a species' : `${species.length} species`} on your watchlist:\n\n${blocks.join('\n\n')}\n\nThe earlier releases stay exactly as they were; calculations pinned to them do not change.\nRelease notes and the full change log:\n${link}\n\nTo stop these messages, remove the species from your watchlist.`,
    };
  },
};

/**
 * Queues e-mails once the transaction they report on has committed. A queue failure is logged,
 * never thrown: the transition happened, and the request must not say otherwise.
 */
export async function sendAfterCommit(queue: MailQueue | undefined, mails: OutgoingMail[]): Promise<void> {
  for (const mail of mails) {
    try {
      await queue?.enqueue(mail);
    } catch (error) {
      console.error(`could not queue the e-mail "${mail.subject}" to ${mail.to}: ${(error as Error).message}`);
    }
  }
}
