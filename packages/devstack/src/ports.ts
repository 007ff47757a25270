/** The loopback ports of the one-machine stack; each can be moved by its variable. */
export const ports = {
  app: Number(process.env.SKYLEDGER_PORT ?? 3000),
  smtp: Number(process.env.SKYLEDGER_SMTP_PORT ?? 1025),
  mailInbox: Number(process.env.SKYLEDGER_MAIL_UI_PORT ?? 1080),
};
