import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { CalculationsModule } from '../calculations/calculations.module';
import { ClassroomsModule } from '../classrooms/classrooms.module';
import { UsersModule } from '../users/users.module';
import { ExerciseSubmission } from './exercise-submission.entity';
import { WorkedExample } from './worked-example.entity';
import { WorkedExamplesController } from './worked-examples.controller';
import { WorkedExamplesService } from './worked-examples.service';

@Module({
  imports: [
    TypeOrmModule.forFeature([WorkedExample, ExerciseSubmission]),
    ClassroomsModule,
    CalculationsModule,
    UsersModule,
  ],
  controllers: [WorkedExamplesController],
  providers: [WorkedExamplesService],
  exports: [WorkedExamplesService],
})
export class WorkedExamplesModule {}
