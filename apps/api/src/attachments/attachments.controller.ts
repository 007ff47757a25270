import {
  Controller,
  Get,
  HttpStatus,
  Post,
  StreamableFile,
  UploadedFile,
  UseInterceptors,
} from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import { ApiBearerAuth, ApiBody, ApiConsumes, ApiTags } from '@nestjs/swagger';
import {
  inlineMediaTypes,
  type AttachmentMediaType,
  type AttachmentView,
} from '@skyledger/contracts';
import { create as contentDisposition } from 'content-disposition';
import { type AuthenticatedUser } from '../auth/authenticated-user';
import { claimRoles } from '../claims/claim-policy';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { UuidParam } from '../common/decorators/uuid-param.decorator';
import { ApiError } from '../common/errors/api-error';
import { AttachmentsService } from './attachments.service';
import { type ReceivedFile } from './staging-multer-storage';

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
  @UseInterceptors(FileInterceptor('file'))
  @ApiConsumes('multipart/form-data')
  @ApiBody({
    schema: {
      type: 'object',
      required: ['file'],
      properties: { file: { type: 'string', format: 'binary' } },
    },
  })
  upload(
    @CurrentUser() actor: AuthenticatedUser,
    @UuidParam() claimId: string,
    @UploadedFile() file: ReceivedFile | undefined,
  ): Promise<AttachmentView> {
    if (!file) {
      throw new ApiError(HttpStatus.BAD_REQUEST, 'Attach a file in the field "file"', {
        file: 'required',
      });
    }
    return this.attachments.add(actor, claimId, file);
  }

  /** The bytes of an evidence file: images and PDFs inline, everything else as a download. */
  @Get('attachments/:id')
  async download(@UuidParam() id: string): Promise<StreamableFile> {
    const { attachment, open } = await this.attachments.download(id);
    const inline = inlineMediaTypes.includes(attachment.mediaType as AttachmentMediaType);
    return new StreamableFile(await open(), {
      type: attachment.mediaType,
      length: attachment.size,
      disposition: contentDisposition(attachment.originalName, {
        type: inline ? 'inline' : 'attachment',
      }),
    });
  }
}
