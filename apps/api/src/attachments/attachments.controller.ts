import { Controller, Get, Post, Res, StreamableFile, UploadedFile } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { type AttachmentView } from '@skyledger/contracts';
import { type Response } from 'express';
import { type AuthenticatedUser } from '../auth/authenticated-user';
import { claimRoles } from '../claims/claim-policy';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { UuidParam } from '../common/decorators/uuid-param.decorator';
import { AttachmentsService } from './attachments.service';
import { FileUpload, requireFile } from './file-upload.decorator';
import { type ReceivedFile } from './staging-multer-storage';
import { storedFileResponse } from './stored-file-response';

@ApiTags('attachments')
@ApiBearerAuth()
@Controller()
export class AttachmentsController {
  constructor(private readonly attachments: AttachmentsService) {}

  /**
   * Uploads an evidence file (multipart field `file`). Its type is read from the bytes;
   * identical bytes are stored once. The role is checked before any byte is received.
   */
  @Post('claims/:id/attachments')
  @Roles(...claimRoles.contribute)
  @FileUpload()
  upload(
    @CurrentUser() actor: AuthenticatedUser,
    @UuidParam() claimId: string,
    @UploadedFile() file: ReceivedFile | undefined,
  ): Promise<AttachmentView> {
    return this.attachments.add(actor, claimId, requireFile(file));
  }

  /** The bytes of an evidence file: images and PDFs inline, everything else as a download. */
  @Get('attachments/:id')
  async download(
    @UuidParam() id: string,
    @Res({ passthrough: true }) res: Response,
  ): Promise<StreamableFile> {
    const { attachment, open } = await this.attachments.download(id);
    return storedFileResponse(res, attachment, await open());
  }
}
