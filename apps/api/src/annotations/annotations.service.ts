import { Inject, Injectable } from '@nestjs/common';
import { chainReadingFromRuler, compactDocument, type AnnotationDocument } from '@benchproof/annotation';
import type { AnnotationDto, ChainFromPhotoRequest, MeasurementDto, SaveAnnotationRequest } from '@benchproof/contracts';
import { DomainInputError } from '@benchproof/domain';
import { AuditService } from '../audit';
import type { AuthUser } from '../core/auth';
import { DomainError } from '../core/http';
import { CLOCK, type Clock } from '../core/clock';
import { InspectionService } from '../inspection';
import { MediaService } from '../media';
import { AnnotationRenderService } from './annotation-render.service';
import { AnnotationsRepository, type AnnotationVersionRow } from './annotations.repository';
import { UnitOfWork } from '../core/db';

/** A photo's annotation: read (migrated), saved as a new version with optimistic concurrency, measured from. */
@Injectable()
export class AnnotationsService {
  constructor(
    private readonly repo: AnnotationsRepository,
    private readonly uow: UnitOfWork,
    private readonly media: MediaService,
    private readonly inspection: InspectionService,
    private readonly render: AnnotationRenderService,
    private readonly audit: AuditService,
    @Inject(CLOCK) private readonly clock: Clock,
  ) {}

  get(actor: AuthUser, assetId: number): AnnotationDto {
    this.media.uprightImage(actor.shopId, assetId, 'screen');
    return toDto(assetId, this.repo.latest(actor.shopId, assetId));
  }

  /** Appends a version; refuses with CONFLICT when someone saved since `baseVersion`. */
  save(actor: AuthUser, assetId: number, req: SaveAnnotationRequest): AnnotationDto {
    const screen = this.media.uprightImage(actor.shopId, assetId, 'screen');
    // Stored on the coordinate grid with long strokes simplified (libs/annotation compact.ts).
    const doc: AnnotationDocument = compactDocument(req.document);
    // The document must describe this photo's upright shape (aspect), or mm would be wrong.
    const aspect = (s: { width: number; height: number }) => s.width / s.height;
    if (Math.abs(aspect(doc.image) - aspect(screen)) > 0.01) {
      throw new DomainError('VALIDATION_FAILED', 'The annotation was drawn on a different image.', {
        issues: [{ path: 'document.image', message: 'The annotation was drawn on a different image.' }],
      });
    }
    const row = this.uow.run(() => {
      const current = this.repo.latest(actor.shopId, assetId)?.version ?? 0;
      if (current !== req.baseVersion) {
        throw new DomainError('CONFLICT', 'Someone saved this annotation after you opened it. Reload to see their version.', { currentVersion: current });
      }
      const saved = this.repo.insert({
        shopId: actor.shopId,
        assetId,
        version: current + 1,
        document: doc,
        savedAt: this.clock.now(),
        savedBy: actor.id,
      });
      this.audit.record(actor, {
        action: 'annotation.saved',
        entityType: 'media_asset',
        entityId: assetId,
        details: { version: saved.version, shapes: doc.shapes.length },
      });
      return saved;
    });
    this.render.enqueue(actor.shopId, assetId, row.version);
    return toDto(assetId, row);
  }

  /** Chain elongation from a saved ruler, recorded on the chain checkpoint with the photo as evidence. */
  chainReading(actor: AuthUser, assetId: number, req: ChainFromPhotoRequest): MeasurementDto {
    const img = this.media.uprightImage(actor.shopId, assetId, 'screen');
    const latest = this.repo.latest(actor.shopId, assetId);
    if (!latest || latest.version !== req.version)
      throw new DomainError('CONFLICT', 'Save the annotation before recording the reading.', { currentVersion: latest?.version ?? 0 });
    const doc = latest.document;
    const fail = (message: string) => new DomainError('VALIDATION_FAILED', message, { issues: [{ path: 'rulerId', message }] });
    if (!doc.shapes.some((s) => s.id === req.rulerId && s.kind === 'ruler')) throw fail('Draw a ruler over the chain first.');
    let reading;
    try {
      reading = chainReadingFromRuler(doc, req.rulerId, req.pitches);
    } catch (err) {
      if (err instanceof DomainInputError) throw fail(err.message);
      throw err;
    }
    if (!reading || reading.measuredMm === null) throw fail('Set a scale on the photo first (draw it over the steel rule).');
    const lengthValue = Math.round(reading.measuredMm * 100) / 100;
    const checkpointId = req.checkpointId ?? this.chainCheckpoint(actor, img.jobId);
    return this.uow.run(() => {
      const m = this.inspection.addMeasurement(actor, img.jobId, checkpointId, {
        kind: 'chain_elongation',
        method: 'ruler',
        pitches: req.pitches,
        lengthValue,
        lengthUnit: 'mm',
      });
      this.repo.addEvidence({ shopId: actor.shopId, measurementId: m.id, assetId, annotationVersion: latest.version });
      this.audit.record(actor, {
        action: 'measurement.from_photo',
        entityType: 'job',
        entityId: img.jobId,
        details: { measurementId: m.id, assetId, version: latest.version, lengthValue, pitches: req.pitches },
      });
      return m;
    });
  }

  private chainCheckpoint(actor: AuthUser, jobId: number): number {
    const cp = this.inspection
      .get(actor, jobId)
      .areas.flatMap((a) => a.checkpoints)
      .find((c) => c.key === 'chain_wear');
    if (!cp) throw new DomainError('NOT_FOUND', 'This job has no chain checkpoint.');
    return cp.id;
  }
}

function toDto(assetId: number, row: AnnotationVersionRow | undefined): AnnotationDto {
  if (!row) return { mediaId: assetId, version: 0, document: null, savedAt: null, savedBy: null };
  return {
    mediaId: assetId,
    version: row.version,
    document: row.document,
    savedAt: row.savedAt.toISOString(),
    savedBy: row.savedBy,
  };
}
