import { Body, Controller, Get, Post, UploadedFile } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import {
  type DatasetDetail,
  type DatasetSummary,
  type DatasetUploadView,
} from '@skyledger/contracts';
import { FileUpload, requireFile } from '../attachments/file-upload.decorator';
import { type ReceivedFile } from '../attachments/staging-multer-storage';
import { type AuthenticatedUser } from '../auth/authenticated-user';
import { claimRoles } from '../claims/claim-policy';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { UuidParam } from '../common/decorators/uuid-param.decorator';
import { DatasetsService } from './datasets.service';
import { CreateDatasetDto } from './dto/create-dataset.dto';

@ApiTags('datasets')
@ApiBearerAuth()
@Controller('datasets')
export class DatasetsController {
  constructor(private readonly datasets: DatasetsService) {}

  /** Step one of an import: the CSV (multipart field `file`), kept, with its columns shown. */
  @Post('uploads')
  @Roles(...claimRoles.research)
  @FileUpload()
  upload(
    @CurrentUser() actor: AuthenticatedUser,
    @UploadedFile() file: ReceivedFile | undefined,
  ): Promise<DatasetUploadView> {
    return this.datasets.upload(actor, requireFile(file, 'a CSV file'));
  }

  /** Step two: the chosen columns, typed row by row; a bad row refuses the whole file. */
  @Post()
  @Roles(...claimRoles.research)
  create(
    @CurrentUser() actor: AuthenticatedUser,
    @Body() dto: CreateDatasetDto,
  ): Promise<DatasetDetail> {
    return this.datasets.create(actor, dto);
  }

  @Get()
  list(): Promise<DatasetSummary[]> {
    return this.datasets.list();
  }

  @Get(':id')
  detail(@UuidParam() id: string): Promise<DatasetDetail> {
    return this.datasets.detail(id);
  }
}
