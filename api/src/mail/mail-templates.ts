/** A message to send: recipients, subject and plain text (mail clients show it as it is). */
export interface MailMessage {
  to: string[];
  subject: string;
  text: string;
  attachments?: { filename: string; content: Buffer; contentType: string }[];
}

interface Person {
  email: string;
  displayName: string;
}

interface VersionRef {
  title: string;
  number: number;
  link: string;
}

const signature = '\n\n-- \nLoftwright, lift and buoyancy workbench';

export function passwordResetMail(user: Person, link: string, ttlMs: number): MailMessage {
  return {
    to: [user.email],
    subject: 'Reset your Loftwright password',
    text:
      `Hello ${user.displayName},\n\nSomeone asked to reset the password of this Loftwright account. ` +
      `To choose a new one, open this link within ${Math.round(ttlMs / 60000)} minutes:\n\n${link}\n\n` +
      `The link works once. If you did not ask for it, ignore this message: your password stays as it is.` +
      signature,
  };
}

export function confirmRegistrationMail(person: Person, link: string, ttlMs: number): MailMessage {
  return {
    to: [person.email],
    subject: 'Finish creating your Loftwright account',
    text:
      `Hello ${person.displayName},\n\nSomeone asked to create a Loftwright account for this address. ` +
      `To finish, open this link within ${Math.round(ttlMs / 3_600_000)} hours:\n\n${link}\n\n` +
      `The link works once. If you did not ask for an account, ignore this message: nothing is created.` +
      signature,
  };
}

/** Sent instead of a confirmation when the address already has an account. */
export function registrationAttemptMail(
  owner: Person,
  signInLink: string,
  resetLink: string,
): MailMessage {
  return {
    to: [owner.email],
    subject: 'Someone tried to create a Loftwright account with your address',
    text:
      `Hello ${owner.displayName},\n\nSomeone asked to create a Loftwright account for this address, ` +
      `which already has one, so nothing was created or changed.\n\n` +
      `If it was you, sign in here: ${signInLink}\n` +
      `If you have forgotten your password, choose a new one here: ${resetLink}\n\n` +
      `If it was not you, ignore this message: your account stays as it is.` +
      signature,
  };
}

export function submittedMail(
  reviewers: Person[],
  author: Person,
  version: VersionRef,
): MailMessage {
  return {
    to: reviewers.map((reviewer) => reviewer.email),
    subject: `Review requested: ${version.title}, version ${version.number}`,
    text:
      `${author.displayName} asks for a review of "${version.title}", version ${version.number}.\n\n` +
      `Open it here: ${version.link}` +
      signature,
  };
}

export function decisionMail(
  author: Person,
  reviewer: Person,
  version: VersionRef,
  approved: boolean,
  comment: string,
): MailMessage {
  return {
    to: [author.email],
    subject: `${approved ? 'Approved' : 'Changes requested'}: ${version.title}, version ${version.number}`,
    text:
      `${reviewer.displayName} ${approved ? 'approved' : 'sent back'} "${version.title}", version ${version.number}.\n\n` +
      `Comment: ${comment}\n\nOpen it here: ${version.link}` +
      signature,
  };
}
