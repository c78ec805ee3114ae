import { type ExecutionContext, Injectable, UnauthorizedException } from '@nestjs/common';
import { AuthGuard } from '@nestjs/passport';

/**
 * For routes anyone may call that act differently for a signed-in person (accepting an invitation):
 * no token passes as anonymous, but a token that is sent must be valid.
 */
@Injectable()
export class OptionalJwtAuthGuard extends AuthGuard('jwt') {
  override canActivate(context: ExecutionContext) {
    const req = context.switchToHttp().getRequest<{ headers: Record<string, string | undefined> }>();
    if (!req.headers.authorization) return true;
    return super.canActivate(context);
  }

  override handleRequest<T>(err: unknown, user: T): T {
    if (err || !user) throw new UnauthorizedException('Sign in again: the token is expired or not valid.');
    return user;
  }
}
