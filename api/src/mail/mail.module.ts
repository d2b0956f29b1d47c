import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { MailService } from './mail.service';
import { OutboxController } from './outbox.controller';
import { OutboxMessage } from './outbox-message.entity';

@Module({
  imports: [TypeOrmModule.forFeature([OutboxMessage])],
  controllers: [OutboxController],
  providers: [MailService],
  exports: [MailService],
})
export class MailModule {}
