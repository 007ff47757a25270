export const invitationStatusMessages = {
  404: 'This invitation link has already been used, or it is not a Skyledger link. If you have set your password already, sign in.',
  410: 'This invitation has expired: invitation links work for 72 hours. Ask your desk chief to send you a fresh one.',
} as const;

export const resetStatusMessages = {
  404: 'This reset link has already been used, or it is not a Skyledger link. Ask for a new one below.',
  410: 'This reset link has expired. Ask for a new one below.',
} as const;
