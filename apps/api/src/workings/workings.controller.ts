import { Body, Controller, Get, HttpCode, HttpStatus, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { type WorkingRerunResponse, type WorkingView } from '@skyledger/contracts';
import { type AuthenticatedUser } from '../auth/authenticated-user';
import { claimPartController } from '../claims/claim-part.controller';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { UuidParam } from '../common/decorators/uuid-param.decorator';
import { CreateWorkingDto } from './dto/create-working.dto';
import { RerunWorkingDto } from './dto/rerun-working.dto';
import { UpdateWorkingDto } from './dto/update-working.dto';
import { workingKind } from './working-kind';
import { WorkingsService } from './workings.service';

/** Save (`POST`), annotate (`PATCH`) and remove (`DELETE`) workings: `claims/:id/workings`. */
export const WorkingPartsController = claimPartController({
  path: 'workings',
  kind: workingKind,
  createDto: CreateWorkingDto,
  updateDto: UpdateWorkingDto,
  // Only the calculator and its inputs are read; outputs in the body are dropped here.
  toValues: ({ calculatorId, inputs, note }) => ({ calculatorId, inputs, note }),
});

@ApiTags('workings')
@ApiBearerAuth()
@Controller('claims/:id/workings')
export class WorkingsController {
  constructor(private readonly workings: WorkingsService) {}

  /** A claim's workings, oldest first. */
  @Get()
  list(@UuidParam() claimId: string): Promise<WorkingView[]> {
    return this.workings.list(claimId);
  }

  /** Runs a working again with the library now in use and says what changed. */
  @Post(':workingId/rerun')
  @HttpCode(HttpStatus.OK)
  rerun(
    @CurrentUser() actor: AuthenticatedUser,
    @UuidParam() claimId: string,
    @UuidParam('workingId') workingId: string,
    @Body() dto: RerunWorkingDto,
  ): Promise<WorkingRerunResponse> {
    return this.workings.rerun(actor, claimId, workingId, dto.version);
  }
}
