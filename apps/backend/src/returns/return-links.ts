import type { EntityManager } from '@mikro-orm/core';
import type { VendorReturn } from './entities/vendor-return.entity';
import { User } from '../users/entities/user.entity';
import { ReturnLink } from './entities/return-link.entity';
import { DAY_MS, LINK_DAYS, newPortalToken, sha256 } from '../common/portal-token';
import { clock } from '../common/clock';

/**
 * A new link to one return notice's page, persisted with the caller's unit of work; the
 * token itself goes only into the e-mail.
 */
export function createReturnLink(
  em: EntityManager,
  config: { jwtSecret: string; publicUrl: string },
  ret: VendorReturn,
  to: string,
  actorId: number,
): { link: ReturnLink; url: string } {
  const token = newPortalToken(config.jwtSecret);
  const link = em.create(ReturnLink, {
    tokenHash: sha256(token),
    vendorReturn: ret,
    sentTo: to,
    expiresAt: new Date(clock.nowMs() + LINK_DAYS * DAY_MS),
    createdBy: em.getReference(User, actorId),
  });
  return { link, url: `${config.publicUrl}/supplier/${token}` };
}
