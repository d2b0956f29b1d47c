import { Module } from '@nestjs/common';
import { AttachmentsModule } from '../attachments/attachments.module';
import { SignOffService } from './sign-off.service';

@Module({
  imports: [AttachmentsModule],
  providers: [SignOffService],
  exports: [SignOffService],
})
export class SignOffModule {}
