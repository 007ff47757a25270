import {
  Inject,
  Injectable,
  Logger,
  type OnApplicationBootstrap,
  type OnModuleDestroy,
} from '@nestjs/common';
import { publishingConfig, type PublishingConfig } from '../config/configuration';
import { PublishingService } from './publishing.service';

/**
 * Lifts embargoes: every PUBLISH_POLL_MS it publishes what is due. Several API instances
 * may run it; each publication is re-checked under its claim's lock, so it happens once.
 */
@Injectable()
export class PublicationScheduler implements OnApplicationBootstrap, OnModuleDestroy {
  private readonly logger = new Logger(PublicationScheduler.name);
  private timer: NodeJS.Timeout | undefined;
  private running: Promise<unknown> | undefined;

  constructor(
    private readonly publishing: PublishingService,
    @Inject(publishingConfig.KEY) private readonly config: PublishingConfig,
  ) {}

  onApplicationBootstrap(): void {
    if (!this.config.schedulerEnabled) return;
    this.timer = setInterval(() => {
      this.running ??= this.publishing
        .publishDue()
        .catch((error: unknown) => this.logger.error(`publishing pass failed: ${String(error)}`))
        .finally(() => (this.running = undefined));
    }, this.config.pollMs);
  }

  async onModuleDestroy(): Promise<void> {
    clearInterval(this.timer);
    await this.running;
  }
}
