import { Injectable, type OnModuleInit } from '@nestjs/common';
import { isoDate } from '../common/calendar';
import { NoticesService, type WatchRound } from '../notices/notices.service';
import { CorrectiveAction } from './entities/corrective-action.entity';

/** SCARs past their date without an answer, for the notices' scan: each once per due date. */
@Injectable()
export class OverdueWatch implements OnModuleInit {
  constructor(private readonly notices: NoticesService) {}

  onModuleInit(): void {
    this.notices.watch('corrective action overdue', (round) => this.scan(round));
  }

  async scan({ em, now, noticed, raise }: WatchRound): Promise<number> {
    let stored = 0;
    const today = isoDate(now);
    const overdue = await em.find(
      CorrectiveAction,
      { status: { $in: ['open', 'reopened'] }, dueOn: { $lt: today } },
      { populate: ['supplier'], orderBy: { id: 'asc' } },
    );
    for (const car of overdue) {
      const key = `scar_overdue:${car.id}:${car.dueOn}`;
      if (await noticed(key)) continue;
      stored += await raise({
        kind: 'scar_overdue',
        key,
        subject: `${car.number} is overdue: ${car.supplier.name} has not answered`,
        body: [
          `${car.supplier.name} was to answer corrective action ${car.number} by ${car.dueOn}; it is ${car.status} and has no answer yet.`,
          `Problem: ${car.problem}`,
          `Follow it up here: ${this.notices.link(`/corrective-actions/${car.id}`)}`,
        ].join('\n\n'),
      });
    }
    return stored;
  }
}
