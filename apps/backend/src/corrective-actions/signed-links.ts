import type { EntityClass, EntityManager, RequiredEntityData } from '@mikro-orm/core';
import { clock } from '../common/clock';
import { DAY_MS, LINK_DAYS, newPortalToken, sha256 } from '../common/portal-token';
import { User } from '../users/entities/user.entity';
import type { SignedLink } from './entities/signed-link.entity';

/**
 * A new supplier link of `kind` (a SCAR's `SupplierLink`, a return notice's `ReturnLink`)
 * to the record `opens` names, working LINK_DAYS, persisted with the caller's unit of
 * work; only its hash is stored, the token itself goes only into the e-mail (`url`).
 */
export function createSignedLink<L extends SignedLink>(
  em: EntityManager,
  config: { jwtSecret: string; publicUrl: string },
  kind: EntityClass<L>,
  opens: Partial<L>,
  to: string,
  actorId: number,
): { link: L; url: string } {
  const token = newPortalToken(config.jwtSecret);
  const link = em.create(kind, {
    ...opens,
    tokenHash: sha256(token),
    sentTo: to,
    expiresAt: new Date(clock.nowMs() + LINK_DAYS * DAY_MS),
    createdBy: em.getReference(User, actorId),
  } as RequiredEntityData<L>);
  return { link, url: `${config.publicUrl}/supplier/${token}` };
}
