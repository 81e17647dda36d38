// The texts of Cordarium's e-mails. Plain text first: every link must work in any mail reader.
import type { Letter } from "./transport";

const signature = "\n\n— Cordarium, an archive of visual evidence for historical performance practice";

export function signInLetter(to: string, url: string): Letter {
  return {
    to,
    subject: "Your Cordarium sign-in link",
    text: `Open this link to sign in to Cordarium:\n\n${url}\n\nThe link works once and expires in 24 hours. If you did not ask for it, ignore this message.${signature}`,
  };
}

export function passwordResetLetter(to: string, url: string): Letter {
  return {
    to,
    subject: "Reset your Cordarium password",
    text: `Someone (we hope you) asked to reset the password of this Cordarium account.\n\nChoose a new password here:\n\n${url}\n\nThe link works once and expires in one hour. If you did not ask for it, your password is unchanged.${signature}`,
  };
}

export function invitationLetter(to: string, url: string, role: string, inviter: string): Letter {
  return {
    to,
    subject: "You are invited to Cordarium",
    text: `${inviter} invites you to Cordarium as ${role === "admin" || role === "editor" ? "an" : "a"} ${role}.\n\nChoose your name and password here:\n\n${url}\n\nThe invitation expires in 7 days.${signature}`,
  };
}
