/** How long a "choose a new password" link works. */
export const RESET_MINUTES = 60;

/** The "choose a new password" e-mail. */
export function resetMail(f: { name: string; link: string; minutes: number }): { subject: string; text: string } {
  return {
    subject: "Choose a new Tankside password",
    text: [
      `Hello ${f.name},`,
      "",
      "Someone (we hope you) asked to choose a new password for your Tankside sign-in. Use this link within",
      `${f.minutes} minutes; it works once:`,
      f.link,
      "",
      "If it was not you, ignore this mail: your password stays as it is.",
    ].join("\n"),
  };
}
