import { Module, type DynamicModule } from '@nestjs/common';
import { coreImports } from '../app.module';
import { UsersModule } from '../users/users.module';

/** What the command-line tools and the demo seed need: the services, without HTTP. */
@Module({})
export class CliModule {
  static forRoot(): DynamicModule {
    return { module: CliModule, imports: [...coreImports(), UsersModule] };
  }
}
