import {
  Body,
  Controller,
  Delete,
  Get,
  HttpCode,
  HttpStatus,
  Param,
  Patch,
  Post,
} from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { type RatingLevelView } from '@skyledger/contracts';
import { type AuthenticatedUser } from '../auth/authenticated-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { CreateRatingLevelDto } from './dto/create-rating-level.dto';
import { UpdateRatingLevelDto } from './dto/update-rating-level.dto';
import { RatingsService } from './ratings.service';

/** The rating scale: the desk reads it (readers see it on the methodology page), a desk chief edits it. */
@ApiTags('rating scale')
@Controller('rating-levels')
export class RatingsController {
  constructor(private readonly ratings: RatingsService) {}

  @ApiBearerAuth()
  @Get()
  list(): Promise<RatingLevelView[]> {
    return this.ratings.list();
  }

  @ApiBearerAuth()
  @Roles('desk_chief')
  @Post()
  create(
    @CurrentUser() actor: AuthenticatedUser,
    @Body() dto: CreateRatingLevelDto,
  ): Promise<RatingLevelView> {
    return this.ratings.create(actor, dto);
  }

  @ApiBearerAuth()
  @Roles('desk_chief')
  @Patch(':levelId')
  update(
    @CurrentUser() actor: AuthenticatedUser,
    @Param('levelId') id: string,
    @Body() dto: UpdateRatingLevelDto,
  ): Promise<RatingLevelView> {
    return this.ratings.update(actor, id, dto);
  }

  @ApiBearerAuth()
  @Roles('desk_chief')
  @Delete(':levelId')
  @HttpCode(HttpStatus.NO_CONTENT)
  remove(@CurrentUser() actor: AuthenticatedUser, @Param('levelId') id: string): Promise<void> {
    return this.ratings.remove(actor, id);
  }
}
