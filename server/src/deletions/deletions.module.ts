import { Module } from '@nestjs/common';
import { MediaModule } from '../media/media.module.js';
import { PanelsModule } from '../panels/panels.module.js';
import { DeletedItemsJob } from './deleted-items.job.js';

/** The purge of deleted panels and images once their grace (DELETION_GRACE_MS) has passed. */
@Module({
  imports: [PanelsModule, MediaModule],
  providers: [DeletedItemsJob],
})
export class DeletionsModule {}
