import { Controller, Get, Header, Query, StreamableFile } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { type AuditEventView, type Page } from '@skyledger/contracts';
import { Roles } from '../common/decorators/roles.decorator';
import { AuditTrailService } from './audit-trail.service';
import { AuditQueryDto } from './dto/audit-query.dto';

/** The append-only audit trail, for the desk chief: nothing here changes it. */
@ApiTags('audit')
@ApiBearerAuth()
@Roles('desk_chief')
@Controller('audit')
export class AuditController {
  constructor(private readonly trail: AuditTrailService) {}

  @Get()
  list(@Query() query: AuditQueryDto): Promise<Page<AuditEventView>> {
    return this.trail.page(query);
  }

  @Get('export')
  @Header('Cache-Control', 'no-store')
  export(@Query() query: AuditQueryDto): StreamableFile {
    return new StreamableFile(this.trail.export(query), {
      type: 'text/csv; charset=utf-8',
      disposition: 'attachment; filename="skyledger-audit.csv"',
    });
  }
}
