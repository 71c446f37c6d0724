// The typed shape of the database, kept in step with migrations/. Row types stay inside repositories.
import type { ColumnType, Generated } from 'kysely';

type Timestamp = ColumnType<Date, Date | string, Date | string>;
/** A timestamp the database fills in when the insert leaves it out. */
type DefaultTimestamp = ColumnType<Date, Date | string | undefined, Date | string>;
/** tstzrange as PostgreSQL prints it, e.g. `["2027-03-02 17:00:00+00","2027-03-02 17:45:00+00")`. */
type Range = string;
type Json<T = unknown> = ColumnType<T, string, string>;

export interface SalonsTable {
  id: Generated<string>;
  slug: string;
  name: string;
  time_zone: string;
  currency: string;
  /** ISO 3166-1 alpha-2; phone numbers without a country code are read as its (migrations/20261204T0910). */
  country: Generated<string>;
  address: Generated<string>;
  phone: Generated<string>;
  skin_test_lead_hours: Generated<number>;
  skin_test_validity_days: Generated<number>;
  cancellation_window_hours: Generated<number>;
  hold_minutes: Generated<number>;
  granularity_minutes: Generated<number>;
  /** Hours before each sitting that reminders go out, e.g. {48,24}. */
  reminder_offsets_hours: Generated<number[]>;
  /** No SMS from quiet_from to quiet_to in the salon's zone ('HH:MM:SS'). */
  quiet_from: Generated<string>;
  quiet_to: Generated<string>;
  /** numeric: pg returns it as a string. */
  max_developer_percent: ColumnType<string, string | number | undefined, string | number>;
  created_at: DefaultTimestamp;
  /** What a cancellation inside the window keeps: the deposit, or nothing (always refunded). */
  cancellation_keeps: ColumnType<'deposit' | 'nothing', 'deposit' | 'nothing' | undefined, 'deposit' | 'nothing'>;
  correction_cents_per_hour: Generated<number>;
  /** Product families beyond oxidative colour and toner that need a skin test here (migrations/20261205T0010). */
  skin_test_families: ColumnType<string[], string[] | undefined, string[]>;
  /** Minutes each limited family may be on the hair, without heat; lift per sitting by hair state (migrations/20261205T0400). */
  lightener_max_minutes: Generated<number>;
  oxidative_colour_max_minutes: Generated<number>;
  toner_oxidative_max_minutes: Generated<number>;
  colour_remover_max_minutes: Generated<number>;
  lift_virgin_levels: Generated<number>;
  lift_coloured_levels: Generated<number>;
  lift_compromised_levels: Generated<number>;
  /** Minutes past a sitting's planned start before the desk may mark a no-show (migrations/20261207T0900). */
  no_show_grace_minutes: Generated<number>;
  /** Hours after a desk booking is made that it is released while its deposit is unpaid; null: never (migrations/20261208T0900). */
  unpaid_deposit_release_hours: ColumnType<number | null, number | null | undefined, number | null>;
  /** Minutes a later client may be asked to start late when an earlier sitting overruns (migrations/20261208T1000). */
  late_start_limit_minutes: Generated<number>;
  /** Tax in thousandths of a percent (8.25 % is 8250), and whether prices include it (migrations/20261208T1205). */
  tax_rate_milli_percent: Generated<number>;
  tax_inclusive: Generated<boolean>;
}

/** A retail product the owner keeps for checkout to sell; retired, never deleted (migrations/20261208T1200). */
export interface RetailProductsTable {
  id: Generated<string>;
  salon_id: string;
  name: string;
  price_cents: number;
  /** Never below zero (a check constraint); checkout lowers it atomically. */
  stock: number;
  active: Generated<boolean>;
  created_at: DefaultTimestamp;
}

/** A guardian's consent to oxidative colour for a client under 16, recorded by the desk (migrations/20261205T0320). */
export interface GuardianConsentsTable {
  id: Generated<string>;
  salon_id: string;
  client_id: string;
  guardian_name: string;
  relationship: string;
  note: Generated<string>;
  recorded_by: string | null;
  recorded_by_name: string;
  recorded_at: DefaultTimestamp;
}

/** An owner's clearance that lets oxidative colour follow a positive skin test (migrations/20261205T0010). */
export interface SkinTestClearancesTable {
  id: Generated<string>;
  salon_id: string;
  client_id: string;
  recorded_by: string | null;
  recorded_by_name: string;
  recorded_at: DefaultTimestamp;
  reason: string;
}

export interface RecurringHoursTable {
  id: Generated<string>;
  rrule: string;
  start_time: string;
  end_time: string;
}
export interface SalonHoursTable extends RecurringHoursTable {
  salon_id: string;
}
export interface StaffHoursTable extends RecurringHoursTable {
  staff_id: string;
}

export interface UsersTable {
  id: Generated<string>;
  salon_id: string;
  email: string;
  name: string;
  phone: string | null;
  role: 'client' | 'front_desk' | 'stylist' | 'owner';
  password_hash: string;
  active: Generated<boolean>;
  password_changed_at: DefaultTimestamp;
  created_at: DefaultTimestamp;
}

export interface PasswordResetsTable {
  id: Generated<string>;
  user_id: string;
  token_hash: string;
  expires_at: Timestamp;
  used_at: Timestamp | null;
}

export interface SignInAttemptsTable {
  id: Generated<string>;
  email: string;
  ip: string;
  succeeded: boolean;
  at: DefaultTimestamp;
}

export interface StaffTable {
  id: Generated<string>;
  salon_id: string;
  user_id: string | null;
  display_name: string;
  skills: string[];
  max_clients_at_once: Generated<number>;
  active: Generated<boolean>;
}

export interface TimeOffTable {
  id: Generated<string>;
  staff_id: string;
  during: Range;
  reason: Generated<string>;
}

export interface ChairsTable {
  id: Generated<string>;
  salon_id: string;
  name: string;
  active: Generated<boolean>;
}
export type BasinsTable = ChairsTable;

export interface ServicesTable {
  id: Generated<string>;
  salon_id: string;
  name: string;
  description: Generated<string>;
  category: 'consultation' | 'skin_test' | 'colour' | 'cut' | 'treatment';
  skill: string;
  price_cents: number;
  price_is_from: Generated<boolean>;
  online_bookable: Generated<boolean>;
  needs_skin_test: Generated<boolean>;
  step_plan: Json;
  active: Generated<boolean>;
  deposit_cents: Generated<number>;
  /** numeric, null for a fixed deposit: when set, the deposit is this share of the price. */
  deposit_percent: ColumnType<string | null, string | number | null | undefined, string | number | null>;
}

/** A chair or a basin out of service for a period (exactly one of the two ids is set). */
export interface OutOfServiceTable {
  id: Generated<string>;
  salon_id: string;
  chair_id: string | null;
  basin_id: string | null;
  during: Range;
  reason: Generated<string>;
}

export interface ClientsTable {
  id: Generated<string>;
  salon_id: string;
  user_id: string | null;
  name: string;
  email: string | null;
  phone: string | null;
  notes: Generated<string>;
  /** Where service messages go; marketing follow-ups also need marketing_opt_in. */
  message_channel: ColumnType<MessageChannelChoice, MessageChannelChoice | undefined, MessageChannelChoice>;
  marketing_opt_in: Generated<boolean>;
  /** Set by an inbound STOP reply: no SMS until START. */
  sms_stopped_at: ColumnType<Date | null, Date | string | null | undefined, Date | string | null>;
  created_at: DefaultTimestamp;
  /** Optional (migrations/20261205T0320); read as text (to_char) so no time zone touches it. */
  date_of_birth: ColumnType<Date | null, string | null | undefined, string | null>;
}
export type MessageChannelChoice = 'sms' | 'email' | 'both';

export interface BookingsTable {
  id: Generated<string>;
  salon_id: string;
  /** Null only while a booking is an unclaimed hold. */
  client_id: string | null;
  hold_secret_hash: ColumnType<string | null, string | null | undefined, string | null>;
  service_id: string;
  stylist_id: string;
  status: 'held' | 'booked' | 'checked_in' | 'finished' | 'checked_out' | 'cancelled' | 'no_show';
  step_plan: Json;
  price_cents: Generated<number>;
  deposit_cents: Generated<number>;
  held_until: Timestamp | null;
  cancel_reason: string | null;
  deposit_outcome: 'kept' | 'refunded' | null;
  created_by: string | null;
  created_at: DefaultTimestamp;
  /** Bumped on every move, so messages planned for older times can be told apart. */
  version: Generated<number>;
  quote_id: ColumnType<string | null, string | null | undefined, string | null>;
  /** When this desk booking is released if its deposit is still unpaid (the salon's setting when it was made). */
  deposit_due_by: ColumnType<Date | null, Date | string | null | undefined, Date | string | null>;
}

export interface SittingsTable {
  id: Generated<string>;
  booking_id: string;
  seq: number;
  chair_id: string;
  during: Range;
  live: Generated<boolean>;
  /** Where the sitting stands on the day (migrations/20261207T0900); the booking's status follows (docs/glossary.md). */
  status: ColumnType<SittingStatus, SittingStatus | undefined, SittingStatus>;
  arrived_at: ColumnType<Date | null, Date | string | null | undefined, Date | string | null>;
  /** Whole minutes the client arrived after the first step's planned start. */
  late_minutes: ColumnType<number | null, number | null | undefined, number | null>;
  /** Why the sitting was finished with steps left open. */
  left_open_reason: ColumnType<string | null, string | null | undefined, string | null>;
}

export type SittingStatus = 'booked' | 'arrived' | 'in_progress' | 'finished' | 'no_show';

export interface BookingStepsTable {
  id: Generated<string>;
  sitting_id: string;
  seq: number;
  kind: 'hands_on' | 'developing' | 'basin';
  label: Generated<string>;
  stylist_id: string;
  basin_id: string | null;
  during: Range;
  live: Generated<boolean>;
  /** The step's actual times and who tapped them, beside the planned `during` (migrations/20261207T0900). */
  actual_start: ColumnType<Date | null, Date | string | null | undefined, Date | string | null>;
  actual_end: ColumnType<Date | null, Date | string | null | undefined, Date | string | null>;
  started_by: ColumnType<string | null, string | null | undefined, string | null>;
  finished_by: ColumnType<string | null, string | null | undefined, string | null>;
}

/** Every tap on a sitting with the state it changed, so the last can be undone for a minute (migrations/20261207T0900). */
export interface SittingTapsTable {
  id: Generated<string>;
  sitting_id: string;
  action: 'arrive' | 'no_show' | 'start' | 'finish' | 'finish_sitting';
  step_seq: number | null;
  at: Timestamp;
  by_user_id: string | null;
  before: Json;
  undone_at: ColumnType<Date | null, Date | string | null | undefined, Date | string | null>;
}

/** A later client told that the day runs late: once per sitting and delay (migrations/20261208T1005). */
export interface RunningLateNoticesTable {
  sitting_id: string;
  minutes_late: number;
  told_at: Timestamp;
  told_by: string | null;
}

export interface AuditLogTable {
  id: Generated<string>;
  salon_id: string;
  actor_user_id: string | null;
  entity: string;
  entity_id: string;
  action: string;
  before: Json | null;
  after: Json | null;
  at: DefaultTimestamp;
}

export interface SkinTestsTable {
  id: Generated<string>;
  salon_id: string;
  client_id: string;
  applied_at: Timestamp;
  read_at: Timestamp | null;
  product: Generated<string>;
  result: 'pending' | 'negative' | 'positive' | 'unclear';
  recorded_by: string | null;
  /** Copied from users by trigger on insert; kept when the account is removed (migrations/20261205T0210). */
  recorded_by_name: string | null;
  /** Who recorded the reading; the name is copied by trigger like recorded_by_name. */
  read_by: string | null;
  read_by_name: string | null;
  notes: Generated<string>;
  created_at: DefaultTimestamp;
  /** When the reading was written down; set by trigger (migrations/20261205T0300). */
  read_recorded_at: ColumnType<Date | null, Date | null | undefined, Date | null>;
}

export interface StandbyEntriesTable {
  id: Generated<string>;
  salon_id: string;
  client_id: string;
  service_ids: string[];
  stylist_id: string | null;
  availability: Json;
  notes: Generated<string>;
  active: Generated<boolean>;
  created_by: string | null;
  created_at: DefaultTimestamp;
}

export interface IdempotencyKeysTable {
  user_id: string;
  key: string;
  route: string;
  /** SHA-256 of the request's canonical JSON (migrations/20261208T1800); null for keys stored before. */
  request_hash: string | null;
  status: number;
  response: Json;
  created_at: DefaultTimestamp;
}

export interface WindowOffersTable {
  id: Generated<string>;
  salon_id: string;
  standby_entry_id: string;
  client_id: string;
  service_id: string;
  stylist_id: string;
  starts_at: Timestamp;
  token_hash: string;
  status: 'offered' | 'taken' | 'gone' | 'expired';
  booking_id: string | null;
  created_by: string | null;
  created_at: DefaultTimestamp;
  expires_at: Timestamp;
}

export type PaymentKind = 'deposit' | 'balance' | 'refund' | 'tip';
export type PaymentMethod = 'card' | 'cash';
export type PaymentStatus = 'pending' | 'succeeded' | 'declined' | 'failed';

/** One money movement each (migrations/20261208T0900): a payment in, or a refund naming the payment it returns. */
export interface PaymentsTable {
  id: Generated<string>;
  salon_id: string;
  booking_id: string;
  client_id: string | null;
  kind: ColumnType<PaymentKind, PaymentKind | undefined, PaymentKind>;
  method: ColumnType<PaymentMethod, PaymentMethod | undefined, PaymentMethod>;
  /** The provider's payment (a payment intent) or refund; null in cash, at the card terminal, or before a refund is made. */
  provider_ref: string | null;
  /** The hosted payment session a card payment came through. */
  provider_session_id: ColumnType<string | null, string | null | undefined, string | null>;
  refund_of: ColumnType<string | null, string | null | undefined, string | null>;
  /** Who took it at the desk; null for what came through the provider. */
  recorded_by: ColumnType<string | null, string | null | undefined, string | null>;
  amount_cents: number;
  currency: string;
  status: PaymentStatus;
  message: Generated<string>;
  created_at: DefaultTimestamp;
  /** The checkout this balance or tip was paid at (migrations/20261209T0900). */
  checkout_id: ColumnType<string | null, string | null | undefined, string | null>;
  /** A tip's stylist: one tip row per stylist who shares it; null for every other kind. */
  staff_id: ColumnType<string | null, string | null | undefined, string | null>;
}

/** A visit's checkout, one per booking; its money is in `payments` (migrations/20261209T0900). */
export interface CheckoutsTable {
  id: Generated<string>;
  salon_id: string;
  booking_id: string;
  currency: string;
  /** The receipt as shared/money/checkout.ts computed it. */
  receipt: ColumnType<unknown, string, string>;
  subtotal_cents: number;
  discount_cents: Generated<number>;
  tax_cents: Generated<number>;
  total_cents: number;
  deposit_applied_cents: Generated<number>;
  tip_cents: Generated<number>;
  /** Left to pay after the deposit, tip included. */
  due_cents: number;
  status: ColumnType<'open' | 'paid', 'open' | 'paid' | undefined, 'open' | 'paid'>;
  created_by: string | null;
  created_at: DefaultTimestamp;
  paid_at: Date | null;
}

/** A salon day's close at the desk: its takings, the cash counted and the difference; one standing per day (migrations/20261210T0900). */
export interface DayClosesTable {
  id: Generated<string>;
  salon_id: string;
  /** The salon's local date (read back with to_char as YYYY-MM-DD). */
  day: ColumnType<Date, string, string>;
  currency: string;
  totals: ColumnType<unknown, string, string>;
  expected_cash_cents: number;
  counted_cash_cents: number;
  difference_cents: ColumnType<number, never, never>;
  note: Generated<string>;
  closed_by: string | null;
  closed_at: DefaultTimestamp;
  reopened_by: ColumnType<string | null, string | null | undefined, string | null>;
  reopened_at: ColumnType<Date | null, Date | null | undefined, Date | null>;
}

/** A hosted payment session, one open per booking and kind (migrations/20261208T0900). */
export interface CheckoutSessionsTable {
  id: Generated<string>;
  salon_id: string;
  booking_id: string;
  client_id: string | null;
  kind: 'deposit' | 'balance';
  amount_cents: number;
  currency: string;
  description: string;
  success_url: string;
  cancel_url: string;
  provider_session_id: string | null;
  url: string | null;
  status: ColumnType<'open' | 'completed' | 'expired', 'open' | 'completed' | 'expired' | undefined, 'open' | 'completed' | 'expired'>;
  expires_at: Timestamp;
  created_at: DefaultTimestamp;
}

/** Every provider webhook event handled, once each. */
export interface PaymentEventsTable {
  event_id: string;
  type: string;
  object_id: string | null;
  received_at: DefaultTimestamp;
}

export interface DepositRequestsTable {
  id: Generated<string>;
  salon_id: string;
  booking_id: string;
  token_hash: string;
  channel: 'sms' | 'email';
  amount_cents: number;
  requested_by: string | null;
  created_at: DefaultTimestamp;
}

export interface CautionAcceptancesTable {
  id: Generated<string>;
  booking_id: string;
  user_id: string | null;
  version: string;
  texts: Json;
  accepted_at: DefaultTimestamp;
}

export interface HairHistoriesTable {
  client_id: string;
  answers: Json;
  updated_at: DefaultTimestamp;
}

export interface ClientPhotosTable {
  id: Generated<string>;
  salon_id: string;
  client_id: string;
  booking_id: string | null;
  kind: 'hair_now' | 'wanted';
  storage_key: string;
  mime: string;
  bytes: number;
  width: number;
  height: number;
  created_at: DefaultTimestamp;
}

export interface MixLogsTable {
  id: Generated<string>;
  salon_id: string;
  booking_id: string;
  sitting_seq: number;
  bowl_no: number;
  product_type: 'lightener' | 'remover' | 'permanent' | 'demi_permanent' | 'direct_dye' | 'toner' | 'bond_builder';
  shade_notes: Generated<string>;
  /** numeric: pg returns it as a string. */
  developer_percent: ColumnType<string | null, string | number | null, string | number | null>;
  ratio: Generated<string>;
  /** Each weighed part and what it is (migrations/20261205T0100). */
  grams: Json<{ kind: ProductCostsTable['product_type'] | 'other'; part: string; grams: number }[]>;
  applied_to: Generated<string>;
  planned_minutes: number | null;
  actual_minutes: number | null;
  heat: Generated<boolean>;
  result_notes: Generated<string>;
  created_by: string | null;
  created_at: DefaultTimestamp;
}

export interface SessionTable {
  sid: string;
  sess: unknown;
  expire: Date;
}

export interface Database {
  skin_test_clearances: SkinTestClearancesTable;
  guardian_consents: GuardianConsentsTable;
  session: SessionTable;
  salons: SalonsTable;
  salon_hours: SalonHoursTable;
  users: UsersTable;
  password_resets: PasswordResetsTable;
  sign_in_attempts: SignInAttemptsTable;
  staff: StaffTable;
  staff_hours: StaffHoursTable;
  time_off: TimeOffTable;
  chairs: ChairsTable;
  basins: BasinsTable;
  services: ServicesTable;
  clients: ClientsTable;
  bookings: BookingsTable;
  sittings: SittingsTable;
  booking_steps: BookingStepsTable;
  sitting_taps: SittingTapsTable;
  running_late_notices: RunningLateNoticesTable;
  audit_log: AuditLogTable;
  skin_tests: SkinTestsTable;
  standby_entries: StandbyEntriesTable;
  idempotency_keys: IdempotencyKeysTable;
  window_offers: WindowOffersTable;
  payments: PaymentsTable;
  checkouts: CheckoutsTable;
  day_closes: DayClosesTable;
  checkout_sessions: CheckoutSessionsTable;
  payment_events: PaymentEventsTable;
  deposit_requests: DepositRequestsTable;
  caution_acceptances: CautionAcceptancesTable;
  hair_histories: HairHistoriesTable;
  client_photos: ClientPhotosTable;
  mix_logs: MixLogsTable;
  messages: MessagesTable;
  out_of_service: OutOfServiceTable;
  product_costs: ProductCostsTable;
  retail_products: RetailProductsTable;
  consultations: ConsultationsTable;
  consultation_photos: ConsultationPhotosTable;
  quotes: QuotesTable;
  strand_tests: StrandTestsTable;
  follow_up_rules: FollowUpRulesTable;
  book_versions: BookVersionsTable;
  book_day_versions: BookDayVersionsTable;
  rate_limit_hits: RateLimitHitsTable;
}

/** Request counts per limit and caller in the current window (migrations/20261208T1810). */
export interface RateLimitHitsTable {
  key: string;
  hits: number;
  reset_at: Timestamp;
}

/** Per-salon version of what every calendar day depends on; moved by triggers (migrations/20261204T0900). */
export interface BookVersionsTable {
  salon_id: string;
  /** bigint: pg returns it as a string. */
  version: ColumnType<string, never, never>;
  bumped_by: ColumnType<string, never, never>;
}

/** Per-salon, per-local-date version of the bookings, time off and closures on that date (same migration). */
export interface BookDayVersionsTable {
  salon_id: string;
  /** A local date in the salon's zone; compared with YYYY-MM-DD strings. */
  day: ColumnType<Date, never, never>;
  version: ColumnType<string, never, never>;
  bumped_by: ColumnType<string, never, never>;
}

/** migrations/20261203T0705. */
export interface StrandTestsTable {
  id: Generated<string>;
  salon_id: string;
  client_id: string;
  tested_at: Timestamp;
  tested: string;
  product_type: MixLogsTable['product_type'];
  /** numeric: pg returns it as a string. */
  developer_percent: ColumnType<string | null, string | number | null, string | number | null>;
  minutes: number;
  result: 'passed' | 'fragile' | 'failed';
  notes: Generated<string>;
  photo_id: string | null;
  recorded_by: string | null;
  /** Copied from users by trigger on insert; kept when the account is removed (migrations/20261205T0210). */
  recorded_by_name: string | null;
  created_at: DefaultTimestamp;
}

/** Consultations and their quotes (migrations/20261203T0700). */
export interface ProductCostsTable {
  salon_id: string;
  /** The product types and, since migrations/20261205T0100, developer. */
  product_type: 'lightener' | 'remover' | 'permanent' | 'demi_permanent' | 'direct_dye' | 'toner' | 'bond_builder' | 'developer';
  /** numeric: pg returns it as a string. */
  cents_per_gram: ColumnType<string, string | number, string | number>;
}
export interface ConsultationsTable {
  id: Generated<string>;
  salon_id: string;
  client_id: string;
  details: Json;
  created_by: string | null;
  created_at: DefaultTimestamp;
}
export interface ConsultationPhotosTable {
  consultation_id: string;
  photo_id: string;
}
export interface QuotesTable {
  id: Generated<string>;
  salon_id: string;
  consultation_id: string;
  client_id: string;
  service_id: string;
  step_plan: Json;
  price_cents: number;
  deposit_cents: number;
  notes: Generated<string>;
  warnings: ColumnType<unknown, string | undefined, string>;
  status: ColumnType<'draft' | 'sent' | 'accepted', 'draft' | 'sent' | 'accepted' | undefined, 'draft' | 'sent' | 'accepted'>;
  sent_at: ColumnType<Date | null, Date | null | undefined, Date | null>;
  accepted_at: ColumnType<Date | null, Date | null | undefined, Date | null>;
  updated_at: DefaultTimestamp;
  /** Why lightener or remover is planned after a failed strand test; '' when not needed (migrations/20261205T0410). */
  override_reason: Generated<string>;
}

/** Owner-edited marketing follow-ups per service (see migrations/20261203T0605). */
export interface FollowUpRulesTable {
  id: Generated<string>;
  salon_id: string;
  service_id: string;
  title: string;
  body: string;
  rrule: string;
  version: Generated<number>;
  created_at: DefaultTimestamp;
}

export type MessageStatus = 'queued' | 'sending' | 'sent' | 'failed' | 'dropped';
export type MessageAttachment = { filename: string; content: string; contentType: string };

/** The send log: one row per message Dwell means to send (see migrations/20261202T0410). */
export interface MessagesTable {
  id: Generated<string>;
  salon_id: string;
  booking_id: string | null;
  booking_version: number | null;
  client_id: string | null;
  kind: string;
  channel: 'sms' | 'email';
  to_address: string;
  subject: Generated<string>;
  body: string;
  attachments: ColumnType<MessageAttachment[], string | undefined, string>;
  send_at: Timestamp;
  dedupe_key: string;
  status: ColumnType<MessageStatus, MessageStatus | undefined, MessageStatus>;
  attempts: Generated<number>;
  last_error: string | null;
  provider_ref: string | null;
  claimed_at: Timestamp | null;
  /** The instant a pg-boss job was queued for; differs from send_at when the row needs a new one. */
  job_at: ColumnType<Date | null, Date | string | null | undefined, Date | string | null>;
  /** When the message was first due; set on its first retry (send_at then moves with the backoff). */
  due_at: ColumnType<Date | null, Date | string | null | undefined, Date | string | null>;
  sent_at: Timestamp | null;
  created_at: DefaultTimestamp;
}
