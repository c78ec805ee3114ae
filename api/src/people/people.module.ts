import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AuthModule } from '../auth/auth.module.js';
import { User } from '../users/user.entity.js';
import { PeopleController } from './people.controller.js';
import { PeopleService } from './people.service.js';

/** The admin's people page (routes under /api/users). */
@Module({
  imports: [TypeOrmModule.forFeature([User]), AuthModule],
  controllers: [PeopleController],
  providers: [PeopleService],
})
export class PeopleModule {}
