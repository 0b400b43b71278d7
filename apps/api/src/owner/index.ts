export { OwnerModule } from './owner.module';
export { OWNER_MEDIA, OWNER_PAIRS, OWNER_REPORT, type OwnerMediaPort, type OwnerPairsPort, type OwnerReportPort, type OwnerShotSource } from './owner.ports';
export { CurrentOwner, OwnerRoute, type LinkOwner } from './owner-link.guard';
