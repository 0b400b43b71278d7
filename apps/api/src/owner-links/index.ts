export { OwnerLinksModule } from './owner-links.module';
export { OwnerLinksService } from './owner-links.service';
export { OWNER_LINK_MAILER, type OwnerActor, type OwnerLinkMail, type OwnerLinkMailerPort } from './owner-links.ports';
