export {
  deskDefaults,
  generateDesk,
  generatedDesk,
  GeneratorRefusal,
  type DeskOptions,
  type GenerateResult,
  type GeneratedDesk,
} from './generate-desk';
export { GENERATED_EMAIL_DOMAIN, type ClaimRow } from './desk-rows';
export { type GeneratedClaim } from './verdict-rows';
