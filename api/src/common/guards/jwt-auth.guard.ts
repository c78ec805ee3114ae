import { Injectable, UnauthorizedException } from '@nestjs/common';
import { AuthGuard } from '@nestjs/passport';

/** Requires a valid bearer token; answers 401 in the API's error shape otherwise. */
@Injectable()
export class JwtAuthGuard extends AuthGuard('jwt') {
  override handleRequest<T>(err: unknown, user: T): T {
    if (err || !user)
      throw new UnauthorizedException('Sign in to continue: the token is missing, expired or not valid.');
    return user;
  }
}
