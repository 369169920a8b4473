import { Column } from 'typeorm';
import { BaseRecord } from './base.entity.js';

/**
 * Something that belongs to one of an athlete's days. `local_date` is the athlete's own calendar
 * date in their time zone when it was logged (never derived from UTC). Each subclass declares the
 * athlete relation (for its named foreign key) and its indexes.
 */
export abstract class DayRecord extends BaseRecord {
  @Column({ name: 'athlete_id', type: 'uuid' })
  athleteId: string;

  /** YYYY-MM-DD in the athlete's time zone. */
  @Column({ name: 'local_date', type: 'date' })
  localDate: string;
}

/** A day record with the clock time the athlete gave and the instant it names. */
export abstract class TimedDayRecord extends DayRecord {
  /** HH:MM as the athlete typed it, in their time zone. */
  @Column({ name: 'local_time', type: 'varchar', length: 5 })
  localTime: string;

  /** `local_date` + `local_time` in the athlete's time zone at the time of logging, as an instant. */
  @Column({ name: 'logged_at', type: 'timestamptz' })
  loggedAt: Date;
}

/**
 * A day entry created with a client-generated id: the unique (athlete_id, client_id) index on
 * each table makes a retried create return the first row instead of adding a second.
 */
export abstract class ClientDayEntry extends TimedDayRecord {
  @Column({ name: 'client_id', type: 'uuid' })
  clientId: string;
}
