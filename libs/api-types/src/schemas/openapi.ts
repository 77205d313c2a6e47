import { z } from 'zod';
import * as answers from './answers.js';
import * as catalog from './catalog.js';
import { errorBody, pageOf } from './common.js';
import * as lots from './lots.js';
import * as records from './records.js';
import * as scorecards from './scorecards.js';

/**
 * The response shapes by the name the OpenAPI document gives them
 * (`#/components/schemas/<Name>`). A route names its answer with the server's `@Answers`.
 */
export const RESPONSE_SCHEMAS = {
  ErrorBody: errorBody,
  Health: answers.health,
  LoginAnswer: answers.loginAnswer,
  SessionUser: catalog.sessionUser,
  User: catalog.user,
  UserList: z.array(catalog.user),
  Supplier: catalog.supplier,
  SupplierPage: pageOf(catalog.supplier),
  Product: catalog.product,
  ProductPage: pageOf(catalog.product),
  SamplingPlanAnswer: lots.samplingPlanAnswer,
  Instrument: records.instrument,
  InstrumentPage: pageOf(records.instrument),
  LotSummary: lots.lotSummary,
  LotSummaryPage: pageOf(lots.lotSummary),
  RejectReached: lots.rejectReached,
  ReceivedBefore: lots.receivedBefore,
  ReceivedLot: lots.receivedLot,
  LotDetail: lots.lotDetail,
  Sample: lots.sample,
  Reading: lots.reading,
  ImportAnswer: answers.importAnswer,
  Photo: lots.photo,
  DecisionResult: lots.decisionResult,
  Concession: lots.concession,
  ConcessionList: z.array(lots.concession),
  ConcessionsAwaitingApproval: lots.concessionsAwaitingApproval,
  NoticeSettings: answers.noticeSettings,
  UnreturnedLots: answers.unreturnedLots,
  RestoreAnswer: answers.restoreAnswer,
  TimelineEvent: records.timelineEvent,
  TimelineEventList: z.array(records.timelineEvent),
  TimelineEventPage: pageOf(records.timelineEvent),
  AuditFacets: records.auditFacets,
  VendorReturn: records.vendorReturn,
  VendorReturnPage: pageOf(records.vendorReturn),
  CorrectiveAction: records.correctiveAction,
  CorrectiveActionUpdate: answers.correctiveActionUpdate,
  CorrectiveActionPage: pageOf(records.correctiveAction),
  SupplierLinkSent: answers.supplierLinkSent,
  LinksRevoked: answers.linksRevoked,
  ScarAttachmentList: z.array(answers.scarAttachment),
  OutboundMessage: records.outboundMessage,
  OutboundMessagePage: pageOf(records.outboundMessage),
  PortalView: answers.portalView,
  PortalScarView: answers.portalScarView,
  PortalAttachment: answers.portalAttachment,
  ScorecardList: scorecards.scorecardList,
  SupplierScorecard: scorecards.supplierScorecard,
} as const;
export type ResponseName = keyof typeof RESPONSE_SCHEMAS;

/**
 * The response schemas as OpenAPI 3.0 components, each shape named once and referred to by
 * `$ref` where another uses it.
 */
export function openApiComponents(): Record<string, object> {
  const registry = z.registry<{ id: string }>();
  for (const [name, schema] of Object.entries(RESPONSE_SCHEMAS)) registry.add(schema, { id: name });
  const { schemas } = z.toJSONSchema(registry, {
    target: 'openapi-3.0',
    uri: (name) => `#/components/schemas/${name}`,
  });
  for (const schema of Object.values(schemas)) {
    delete (schema as { $id?: string }).$id;
    nullInEnums(schema);
  }
  return schemas;
}

/** A nullable enum lists null among its values (OpenAPI 3.0.3, 4.7.25.1; validators need it). */
function nullInEnums(node: unknown): void {
  if (Array.isArray(node)) return node.forEach(nullInEnums);
  if (typeof node !== 'object' || node === null) return;
  const schema = node as { nullable?: boolean; enum?: unknown[] };
  if (schema.nullable && schema.enum && !schema.enum.includes(null)) schema.enum.push(null);
  Object.values(node).forEach(nullInEnums);
}
