/** Said when a change carried a version someone else had moved past: nothing was saved. */
export const staleWorkingMessage =
  'Someone else changed this working meanwhile, so your change was not saved. It now shows as it stands: check it, then try again.';
