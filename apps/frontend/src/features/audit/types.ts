/** TimelineEvent of docs/api-conventions.md. */
export interface TimelineEvent {
  id: number;
  at: string;
  actor: { id: number; name: string } | null;
  actorEmail: string;
  action: string;
  entityType: string;
  entityId: number | null;
  lotId?: number | null;
  summary: string;
  before: Record<string, unknown> | null;
  after: Record<string, unknown> | null;
}
