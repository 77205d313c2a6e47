import { AuditEvent } from '../audit/entities/audit-event.entity';
import { CorrectiveAction } from '../corrective-actions/entities/corrective-action.entity';
import { Concession } from '../decisions/entities/concession.entity';
import { Decision } from '../decisions/entities/decision.entity';
import { Nonconformance } from '../decisions/entities/nonconformance.entity';
import { ClientKey } from '../inspection/entities/client-key.entity';
import { Reading } from '../inspection/entities/reading.entity';
import { ReadingImport } from '../inspection/entities/reading-import.entity';
import { Sample } from '../inspection/entities/sample.entity';
import { Instrument } from '../instruments/entities/instrument.entity';
import { Lot } from '../lots/entities/lot.entity';
import { OutboundMessage } from '../mail/entities/outbound-message.entity';
import { Notice } from '../notices/entities/notice.entity';
import { NoticeSettings } from '../notices/entities/notice-settings.entity';
import { Photo } from '../photos/entities/photo.entity';
import { ConductorSpec } from '../products/entities/conductor-spec.entity';
import { InspectionState } from '../products/entities/inspection-state.entity';
import { Product } from '../products/entities/product.entity';
import { OpenReturnLot } from '../returns/entities/open-return-lot.entity';
import { VendorReturn } from '../returns/entities/vendor-return.entity';
import { Supplier } from '../suppliers/entities/supplier.entity';
import { ScarAttachment } from '../corrective-actions/entities/scar-attachment.entity';
import { ReturnLink } from '../returns/entities/return-link.entity';
import { SupplierLink } from '../corrective-actions/entities/supplier-link.entity';
import { User } from '../users/entities/user.entity';
import { ChangeCounter } from '../common/change-counter.entity';

/** Every entity, in one list, so the migrator and every test see the same schema. */
export const ENTITIES = [
  User,
  Supplier,
  Product,
  ConductorSpec,
  InspectionState,
  Lot,
  Sample,
  Reading,
  ReadingImport,
  Instrument,
  Photo,
  Decision,
  Concession,
  Nonconformance,
  VendorReturn,
  OpenReturnLot,
  CorrectiveAction,
  SupplierLink,
  ReturnLink,
  ScarAttachment,
  AuditEvent,
  OutboundMessage,
  NoticeSettings,
  Notice,
  ClientKey,
  ChangeCounter,
];
