export { OwnerModule } from './owner.module';
export { OwnerLinksService } from './owner-links.service';
export {
  OWNER_LINK_MAILER,
  OWNER_MEDIA,
  OWNER_PAIRS,
  OWNER_REPORT,
  type OwnerActor,
  type OwnerLinkMail,
  type OwnerLinkMailerPort,
  type OwnerMediaPort,
  type OwnerPairsPort,
  type OwnerReportPort,
  type OwnerShotSource,
  type StreamReply,
} from './owner.ports';
export { CurrentOwner, OwnerLinkGuard } from './owner-link.guard';
