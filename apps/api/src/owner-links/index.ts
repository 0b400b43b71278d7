export { OwnerLinksModule } from './owner-links.module';
export { OwnerLinksService } from './owner-links.service';
export { OwnerLiveEvents } from './owner-events';
export { OWNER_LINK_MAILER, type OwnerActor, type OwnerLinkMail, type OwnerLinkMailerPort } from './owner-links.ports';
