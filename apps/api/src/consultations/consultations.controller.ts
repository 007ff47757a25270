import { claimPartController } from '../claims/claim-part.controller';
import { consultationKind } from './consultation-kind';
import { CreateConsultationDto } from './dto/create-consultation.dto';
import { UpdateConsultationDto } from './dto/update-consultation.dto';

/** Experts the desk consulted: `claims/:id/consultations`. */
export const ConsultationsController = claimPartController({
  path: 'consultations',
  kind: consultationKind,
  createDto: CreateConsultationDto,
  updateDto: UpdateConsultationDto,
});
