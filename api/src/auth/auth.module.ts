import { Inject, type MiddlewareConsumer, Module, type NestModule, RequestMethod } from '@nestjs/common';
import { JwtModule } from '@nestjs/jwt';
import { PassportModule } from '@nestjs/passport';
import { APP_CONFIG, type AppConfig } from '../config/app-config.js';
import { TypeOrmModule } from '@nestjs/typeorm';
import { UsersModule } from '../users/users.module.js';
import { AuthController } from './auth.controller.js';
import { AuthService } from './auth.service.js';
import { JwtStrategy } from './jwt.strategy.js';
import { PendingRegistrationRow } from './pending-registration.entity.js';
import { RegistrationService } from './registration.service.js';
import { SignInBackoffService } from './sign-in-backoff.service.js';
import { SignInFailureRow } from './sign-in-failure.entity.js';
import { signInRateLimit } from './sign-in-rate-limit.js';

@Module({
  imports: [
    UsersModule,
    TypeOrmModule.forFeature([SignInFailureRow, PendingRegistrationRow]),
    PassportModule,
    JwtModule.registerAsync({
      inject: [APP_CONFIG],
      useFactory: (config: AppConfig) => ({
        secret: config.jwtSecret,
        signOptions: { expiresIn: config.jwtExpiresInSeconds, algorithm: 'HS256' },
      }),
    }),
  ],
  controllers: [AuthController],
  providers: [AuthService, RegistrationService, JwtStrategy, SignInBackoffService],
  exports: [AuthService, SignInBackoffService],
})
export class AuthModule implements NestModule {
  constructor(@Inject(APP_CONFIG) private readonly config: AppConfig) {}

  configure(consumer: MiddlewareConsumer): void {
    consumer.apply(signInRateLimit(this.config)).forRoutes({ path: 'auth/login', method: RequestMethod.POST });
    // Sign-up gets a looser limit of its own: a family may register several people from one address.
    consumer.apply(signInRateLimit(this.config, 4)).forRoutes({ path: 'auth/register', method: RequestMethod.POST });
  }
}
