import {
  Body,
  Controller,
  Delete,
  HttpCode,
  HttpStatus,
  Patch,
  Post,
  type Type,
} from '@nestjs/common';
import { ApiBearerAuth, ApiBody, ApiTags } from '@nestjs/swagger';
import { type AuthenticatedUser } from '../auth/authenticated-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { UuidParam } from '../common/decorators/uuid-param.decorator';
import { createValidationPipe } from '../common/pipes/validation.pipe';
import { type ClaimPartKind } from './claim-part-kind';
import { ClaimPartsService } from './claim-parts.service';
import { type ClaimPart } from './entities/claim-part';

interface ClaimPartRoutes<Part extends ClaimPart, View, Create, Update> {
  /** The path under `claims/:id/`, e.g. `reply-attempts`. */
  path: string;
  kind: ClaimPartKind<Part, View>;
  createDto: Type<Create>;
  updateDto: Type<Update>;
  /** Turns a request body into entity fields (dates from strings, ...); identity by default. */
  toValues?: (dto: Partial<Create>) => Partial<Part>;
}

/**
 * The controller of one kind of claim part: `POST claims/:id/<path>`,
 * `PATCH claims/:id/<path>/:partId` (with the version the editor saw) and
 * `DELETE claims/:id/<path>/:partId`. One class serves every kind, so they behave alike.
 */
export function claimPartController<
  Part extends ClaimPart,
  View,
  Create extends object,
  Update extends Partial<Create> & { version: number },
>(routes: ClaimPartRoutes<Part, View, Create, Update>): Type {
  const toValues = routes.toValues ?? ((dto: Partial<Create>) => dto as Partial<Part>);

  @ApiTags(routes.path)
  @ApiBearerAuth()
  @Controller(`claims/:id/${routes.path}`)
  class ClaimPartController {
    constructor(readonly parts: ClaimPartsService) {}

    @Post()
    @ApiBody({ type: routes.createDto })
    add(
      @CurrentUser() actor: AuthenticatedUser,
      @UuidParam() claimId: string,
      @Body(createValidationPipe(routes.createDto)) dto: Create,
    ): Promise<View> {
      return this.parts.add(routes.kind, actor, claimId, toValues(dto));
    }

    @Patch(':partId')
    @ApiBody({ type: routes.updateDto })
    update(
      @CurrentUser() actor: AuthenticatedUser,
      @UuidParam() claimId: string,
      @UuidParam('partId') partId: string,
      @Body(createValidationPipe(routes.updateDto)) dto: Update,
    ): Promise<View> {
      const { version, ...fields } = dto;
      return this.parts.update(
        routes.kind,
        actor,
        claimId,
        partId,
        toValues(fields as unknown as Partial<Create>),
        version,
      );
    }

    @Delete(':partId')
    @HttpCode(HttpStatus.NO_CONTENT)
    remove(
      @CurrentUser() actor: AuthenticatedUser,
      @UuidParam() claimId: string,
      @UuidParam('partId') partId: string,
    ): Promise<void> {
      return this.parts.remove(routes.kind, actor, claimId, partId);
    }
  }

  const name = routes.kind.name.replace(/(^|_)(\w)/g, (_m, _s, c: string) => c.toUpperCase());
  Object.defineProperty(ClaimPartController, 'name', { value: `${name}sController` });
  return ClaimPartController;
}
