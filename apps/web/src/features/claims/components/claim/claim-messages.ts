/** Said when a change carried a version someone else had moved past: nothing was saved. */
export const staleClaimMessage =
  'Someone else changed this claim meanwhile, so your change was not saved. The page now shows it as it stands: check it, then try again.';
