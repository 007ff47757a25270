import { Controller, Get } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { type DeskPerson } from '@skyledger/contracts';
import { UsersService } from './users.service';

/** Who is on the desk, for everyone on it: names and roles only, active people only. */
@ApiTags('users')
@ApiBearerAuth()
@Controller('people')
export class PeopleController {
  constructor(private readonly users: UsersService) {}

  @Get()
  list(): Promise<DeskPerson[]> {
    return this.users.activePeople();
  }
}
