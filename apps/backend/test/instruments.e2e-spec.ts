import { MikroORM, RequestContext } from '@mikro-orm/core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { InstrumentsService } from '../src/instruments/instruments.service';
import { call, dayFromToday } from './helpers/api';
import { DEMO, startTestApp, type TestApp } from './helpers/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(async () => t.close());

const balance = (serial: string, dueInDays = 200) => ({
  kind: 'balance',
  name: `Bench balance ${serial}`,
  serial,
  resolution: 0.01,
  resolutionUnit: 'g',
  calibratedOn: dayFromToday(dueInDays - 365),
  calibrationDueOn: dayFromToday(dueInDays),
});

describe('POST /api/instruments', () => {
  it('lets the QA lead and admin register, and refuses clerk and purchasing', async () => {
    const qa = await call(t, DEMO.qa, 'post', '/api/instruments', balance('T-QA'));
    expect(qa.status).toBe(201);
    expect(qa.body).toMatchObject({
      kind: 'balance',
      serial: 'T-QA',
      active: true,
      calibrationStatus: 'ok',
      daysToDue: 200,
    });
    const admin = await call(t, DEMO.admin, 'post', '/api/instruments', balance('T-AD'));
    expect(admin.status).toBe(201);
    for (const who of [DEMO.clerk, DEMO.buyer]) {
      const res = await call(t, who, 'post', '/api/instruments', balance(`T-${who}`));
      expect(res.status).toBe(403);
    }
    expect((await t.http.post('/api/instruments').send(balance('T-ANON'))).status).toBe(401);
  });

  it('names every bad field', async () => {
    const res = await call(t, DEMO.qa, 'post', '/api/instruments', {
      kind: 'scale',
      name: '',
      serial: 'X',
      resolution: 0,
      resolutionUnit: 'kg',
      calibratedOn: '1 May',
      calibrationDueOn: '2027-01-01',
    });
    expect(res.status).toBe(400);
    expect(res.body.message).toEqual(
      expect.arrayContaining([
        expect.stringMatching(/^kind must be one of balance/),
        'name is required',
        'resolution must be greater than 0',
        expect.stringMatching(/^resolutionUnit must be one of g, mm, ohm, mohm, degC/),
        'calibratedOn must be a date written YYYY-MM-DD',
      ]),
    );
  });

  it('refuses a unit that does not fit the kind and a due date not after calibration', async () => {
    const res = await call(t, DEMO.qa, 'post', '/api/instruments', {
      ...balance('T-BAD'),
      resolutionUnit: 'mm',
      calibratedOn: '2026-05-01',
      calibrationDueOn: '2026-05-01',
    });
    expect(res.status).toBe(400);
    expect(res.body.message).toEqual([
      'resolutionUnit of a balance must be g',
      'calibrationDueOn must be after calibratedOn',
    ]);
    const feb30 = await call(t, DEMO.qa, 'post', '/api/instruments', {
      ...balance('T-BAD2'),
      calibrationDueOn: '2027-02-30',
    });
    expect(feb30.status).toBe(400);
    expect(feb30.body.message).toEqual(['calibrationDueOn is not a real date']);
  });

  it('answers 409 for a serial already registered', async () => {
    await call(t, DEMO.qa, 'post', '/api/instruments', balance('T-DUP'));
    const res = await call(t, DEMO.qa, 'post', '/api/instruments', balance('T-DUP'));
    expect(res.status).toBe(409);
    expect(res.body.message).toBe('An instrument with serial T-DUP is already registered');
  });
});

describe('GET /api/instruments', () => {
  it('lets every role read, with status and days to due', async () => {
    await call(t, DEMO.qa, 'post', '/api/instruments', balance('T-SOON', 5));
    await call(t, DEMO.qa, 'post', '/api/instruments', balance('T-LATE', -3));
    for (const who of [DEMO.clerk, DEMO.buyer, DEMO.qa, DEMO.admin]) {
      const res = await call(t, who, 'get', '/api/instruments?pageSize=100');
      expect(res.status).toBe(200);
      expect(res.body.total).toBe(res.body.items.length);
    }
    const res = await call(t, DEMO.clerk, 'get', '/api/instruments?dueWithinDays=14&pageSize=100');
    const bySerial = new Map(res.body.items.map((i: { serial: string }) => [i.serial, i]));
    expect(bySerial.get('T-SOON')).toMatchObject({ calibrationStatus: 'due_soon', daysToDue: 5 });
    expect(bySerial.get('T-LATE')).toMatchObject({ calibrationStatus: 'overdue', daysToDue: -3 });
    expect(bySerial.has('T-QA')).toBe(false);
    for (const i of res.body.items) expect(i.calibrationStatus).not.toBe('ok');
  });

  it('filters by kind and active, pages and sorts', async () => {
    const kind = await call(t, DEMO.clerk, 'get', '/api/instruments?kind=thermometer');
    for (const i of kind.body.items) expect(i.kind).toBe('thermometer');
    const paged = await call(
      t,
      DEMO.clerk,
      'get',
      '/api/instruments?page=2&pageSize=2&sort=serial:desc',
    );
    expect(paged.body).toMatchObject({ page: 2, pageSize: 2 });
    expect(paged.body.items).toHaveLength(2);
    const all = await call(t, DEMO.clerk, 'get', '/api/instruments?pageSize=100&sort=serial:desc');
    const serials = all.body.items.map((i: { serial: string }) => i.serial);
    expect(serials).toEqual([...serials].sort().reverse());
    expect(paged.body.items.map((i: { serial: string }) => i.serial)).toEqual(serials.slice(2, 4));
    const bad = await call(t, DEMO.clerk, 'get', '/api/instruments?sort=colour:asc&pageSize=500');
    expect(bad.status).toBe(400);
    expect(bad.body.message).toEqual(['pageSize must be a whole number from 1 to 100']);
    const badSort = await call(t, DEMO.clerk, 'get', '/api/instruments?sort=colour:asc');
    expect(badSort.body.message).toEqual([
      'sort field must be one of name, kind, serial, calibrationDueOn',
    ]);
  });
});

describe('PATCH /api/instruments/:id', () => {
  it('recalibrates and retires, audited; refuses clerk and bad dates', async () => {
    const made = await call(t, DEMO.qa, 'post', '/api/instruments', balance('T-PATCH', -1));
    const id = made.body.id as number;
    const clerk = await call(t, DEMO.clerk, 'patch', `/api/instruments/${id}`, { active: false });
    expect(clerk.status).toBe(403);
    const bad = await call(t, DEMO.qa, 'patch', `/api/instruments/${id}`, {
      version: made.body.version,
      calibrationDueOn: made.body.calibratedOn,
    });
    expect(bad.status).toBe(400);
    expect(bad.body.message).toEqual(['calibrationDueOn must be after calibratedOn']);
    const ok = await call(t, DEMO.qa, 'patch', `/api/instruments/${id}`, {
      version: made.body.version,
      calibratedOn: dayFromToday(0),
      calibrationDueOn: dayFromToday(365),
    });
    expect(ok.status).toBe(200);
    expect(ok.body).toMatchObject({ calibrationStatus: 'ok', daysToDue: 365 });
    const retired = await call(t, DEMO.admin, 'patch', `/api/instruments/${id}`, {
      version: ok.body.version,
      active: false,
    });
    expect(retired.body.active).toBe(false);
    expect(
      (await call(t, DEMO.qa, 'patch', '/api/instruments/99999', { version: 1, active: true }))
        .status,
    ).toBe(404);
  });
});

describe('InstrumentsService.assertUsable', () => {
  it('refuses an overdue or retired instrument with its name and due date, accepts a current one', async () => {
    const late = await call(t, DEMO.qa, 'post', '/api/instruments', {
      ...balance('B-2'),
      name: 'Bench balance B-2',
      calibratedOn: '2025-10-31',
      calibrationDueOn: '2026-10-31',
    });
    const ok = await call(t, DEMO.qa, 'post', '/api/instruments', balance('B-OK'));
    const instruments = t.app.get(InstrumentsService);
    const orm = t.app.get(MikroORM);
    // As a reading does: inside the request's unit of work.
    const service = {
      assertUsable: (ids: number[], on: Date) =>
        RequestContext.create(orm.em.fork(), () => instruments.assertUsable(ids, on)),
    };
    const lateId = late.body.id as number;
    await expect(
      service.assertUsable([lateId], new Date('2026-11-01T08:00:00Z')),
    ).rejects.toMatchObject({
      status: 422,
      message:
        "Balance 'Bench balance B-2' (serial B-2) was due for calibration on 2026-10-31; readings with it are refused until it is recalibrated.",
    });
    // Still usable on its due date.
    const onDue = await service.assertUsable([lateId], new Date('2026-10-31T20:00:00Z'));
    expect(onDue.map((i) => i.serial)).toEqual(['B-2']);
    const usable = await service.assertUsable(
      [ok.body.id, lateId],
      new Date('2026-10-01T00:00:00Z'),
    );
    expect(usable.map((i) => i.serial)).toEqual(['B-OK', 'B-2']);
    await call(t, DEMO.qa, 'patch', `/api/instruments/${ok.body.id}`, {
      version: ok.body.version,
      active: false,
    });
    await expect(service.assertUsable([ok.body.id], new Date())).rejects.toMatchObject({
      status: 422,
      message: expect.stringMatching(/serial B-OK\) is retired/),
    });
    await expect(service.assertUsable([424242], new Date())).rejects.toMatchObject({ status: 422 });
  });
});

describe('demo instrument register', () => {
  it('holds one instrument of each kind, one overdue and one due within 14 days', async () => {
    const res = await call(t, DEMO.clerk, 'get', '/api/instruments?pageSize=100');
    const demo = res.body.items.filter((i: { serial: string }) => i.serial.startsWith('GP-'));
    expect(demo.map((i: { kind: string }) => i.kind).sort()).toEqual([
      'balance',
      'caliper',
      'length_rule',
      'micrometer',
      'milliohm_meter',
      'thermometer',
    ]);
    const status = (s: string) =>
      demo.filter((i: { calibrationStatus: string }) => i.calibrationStatus === s);
    expect(status('overdue')).toHaveLength(1);
    expect(status('due_soon')).toHaveLength(1);
    expect(demo.find((i: { kind: string }) => i.kind === 'balance')).toMatchObject({
      resolution: 0.01,
      resolutionUnit: 'g',
      calibrationStatus: 'ok',
    });
  });
});
