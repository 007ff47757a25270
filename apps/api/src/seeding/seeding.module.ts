import { Module, type DynamicModule } from '@nestjs/common';
import { coreImports } from '../app.module';
import { AttachmentsModule } from '../attachments/attachments.module';
import { ClaimantsModule } from '../claimants/claimants.module';
import { ClaimLifeModule } from '../claim-life/claim-life.module';
import { ClaimsModule } from '../claims/claims.module';
import { DatasetsModule } from '../datasets/datasets.module';
import { PublishingModule } from '../publishing/publishing.module';
import { VerdictsModule } from '../verdicts/verdicts.module';
import { SourcesModule } from '../sources/sources.module';
import { UsersModule } from '../users/users.module';

/** The services the demo seed goes through: people, and the claims desk. No HTTP. */
@Module({})
export class SeedingModule {
  static forRoot(): DynamicModule {
    return {
      module: SeedingModule,
      imports: [
        ...coreImports(),
        UsersModule,
        ClaimantsModule,
        ClaimsModule,
        ClaimLifeModule,
        SourcesModule,
        AttachmentsModule,
        DatasetsModule,
        VerdictsModule,
        PublishingModule,
      ],
    };
  }
}
