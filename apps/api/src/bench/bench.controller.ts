import { Controller, Get } from '@nestjs/common';
import { ApiExcludeController } from '@nestjs/swagger';
import { Public } from '../common/decorators/public.decorator';

const PONG = { pong: true } as const;

/**
 * The benchmark's reference routes (`npm run bench`): a constant JSON answer through the
 * same stack as every route (Express, Nest's guards, pipes and filter, the serializer),
 * so a measured route's ratio to it is the cost of that route's own work. `/api/health`
 * queries the database, so it cannot serve.
 */
@ApiExcludeController()
@Controller('bench')
export class BenchController {
  @Public()
  @Get('ping')
  ping(): typeof PONG {
    return PONG;
  }

  /** The same answer behind the sign-in: the floor under every signed-in route. */
  @Get('signed-in-ping')
  signedInPing(): typeof PONG {
    return PONG;
  }
}
