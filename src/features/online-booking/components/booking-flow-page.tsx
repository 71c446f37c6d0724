import { useQuery, useQueryClient } from '@tanstack/react-query';
import { useCallback, useRef, useState } from 'react';
import { Navigate, useNavigate } from 'react-router-dom';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { Cautions, PublicSalon } from '@shared/schemas/online-booking.schemas';
import { FormAlert } from '@client/components/ui/form-alert';
import { LoadingState } from '@client/components/ui/loading-state';
import { Notice } from '@client/components/ui/notice';
import { paths } from '@client/config/paths';
import { holdLapsed } from '@client/lib/cache-rules';
import { onlineBookingQueries } from '../api/online-booking-queries';
import { flowStepsFor, type FlowStep } from '../flow-steps';
import { useStoredHold, writeStoredHold, type StoredHold } from '../hold-store';
import { AccountStep } from './account-step';
import { CautionsStep } from './cautions-step';
import { ChooseTimeStep } from './choose-time-step';
import { ClaimStep } from './claim-step';
import { DepositStep } from './deposit-step';
import { DetailsStep } from './details-step';
import { FlowProgress } from './flow-progress';
import { HoldLapsed } from './hold-lapsed';
import { HoldSummary } from './hold-summary';
import { ReleaseHeldTime } from './release-held-time';

/** `paymentCancelled`: the client came back from the payment page without paying. */
type Props = { salon: PublicSalon; serviceId: string; user: SessionUser | null; returnTo: string; paymentCancelled: boolean };

/**
 * The online booking flow. Which step shows follows from the stored hold, the
 * hold's state on the server and who is signed in, so a reload or the trip to
 * sign in lands on the right step.
 */
export function BookingFlowPage({ salon, serviceId, user, returnTo, paymentCancelled }: Props) {
  const navigate = useNavigate();
  const queryClient = useQueryClient();
  const [stored, save] = useStoredHold(salon.slug, serviceId);
  const [expired, setExpired] = useState(false);
  const hold = useQuery({ ...onlineBookingQueries.hold(stored?.holdId ?? ''), enabled: Boolean(stored) });
  const firstStep = useRef<FlowStep | null>(null);
  const movedOn = useRef(false);

  const onExpire = useCallback(() => {
    setExpired(true);
    if (stored) void holdLapsed(queryClient, stored.holdId);
  }, [queryClient, stored]);
  const onClaimed = useCallback(
    (claimed: { cautions: Cautions }) => {
      if (stored) save({ ...stored, cautions: claimed.cautions });
    },
    [stored, save],
  );
  const pickAgain = () => {
    save(null);
    setExpired(false);
  };
  const onBooked = (holdId: string) => {
    save(null);
    navigate(paths.bookingConfirmed(holdId));
  };
  // Back into the flow of a held time: here when it is this service, otherwise on its own page (which reads it back).
  const onResumed = (resumed: StoredHold) => {
    setExpired(false);
    if (resumed.slug === salon.slug && resumed.serviceId === serviceId) return save(resumed);
    writeStoredHold(resumed);
    navigate(paths.salonBook(resumed.slug, resumed.serviceId));
  };

  const step: FlowStep = !stored ? 'time' : !user ? 'account' : !stored.detailsDone ? 'details' : !stored.cautionsAccepted ? 'cautions' : 'deposit';
  // Focus follows the flow once it has moved on from the step the page opened at (also when it comes back to it).
  firstStep.current ??= step;
  if (step !== firstStep.current) movedOn.current = true;
  const focusOnMount = movedOn.current;

  const body = () => {
    if (!stored) {
      const onHeld = (h: { holdId: string; holdSecret: string }) =>
        save({ holdId: h.holdId, secret: h.holdSecret, slug: salon.slug, serviceId, cautions: null, detailsDone: false, cautionsAccepted: false });
      return (
        <ChooseTimeStep
          salon={salon}
          serviceId={serviceId}
          signedInClient={user?.role === 'client'}
          focusOnMount={focusOnMount}
          onHeld={onHeld}
          onResumed={onResumed}
        />
      );
    }
    if (hold.isPending) return <LoadingState label="Checking your held time…" />;
    if (hold.isError) {
      const gone = hold.error.status === 404 || hold.error.code === 'HOLD_LAPSED';
      return gone ? <HoldLapsed onPickAgain={pickAgain} /> : <FormAlert>{hold.error.message}</FormAlert>;
    }
    if (hold.data.status === 'booked') return user ? <Navigate to={paths.bookingConfirmed(hold.data.holdId)} replace /> : null;
    if (hold.data.status === 'lapsed' || expired) return <HoldLapsed onPickAgain={pickAgain} />;
    const release = user?.role === 'client' && <ReleaseHeldTime holdId={stored.holdId} secret={stored.secret} onReleased={pickAgain} />;
    const summary = <HoldSummary hold={hold.data} onExpire={onExpire} action={release} />;
    if (!user) {
      return (
        <>
          {summary}
          <AccountStep returnTo={returnTo} focusOnMount={focusOnMount} />
        </>
      );
    }
    if (user.role !== 'client') {
      return (
        <Notice tone="info" title="Booking online is for client accounts">
          Sign out and sign in with a client account to book this time.
        </Notice>
      );
    }
    if (!stored.cautions) {
      return (
        <>
          {summary}
          <ClaimStep holdId={stored.holdId} secret={stored.secret} onClaimed={onClaimed} onResumedOther={onResumed} />
        </>
      );
    }
    const { holdId, secret, cautions } = stored;
    const current =
      step === 'details' ? (
        <DetailsStep holdId={holdId} focusOnMount={focusOnMount} onDone={() => save({ ...stored, detailsDone: true })} />
      ) : step === 'cautions' ? (
        <CautionsStep
          holdId={holdId}
          secret={secret}
          cautions={cautions}
          focusOnMount={focusOnMount}
          onAccepted={() => save({ ...stored, cautionsAccepted: true })}
        />
      ) : (
        <DepositStep
          hold={hold.data}
          secret={secret}
          cancellationPolicy={salon.policies.cancellation}
          focusOnMount={focusOnMount}
          cancelled={paymentCancelled}
          onBooked={() => onBooked(holdId)}
        />
      );
    return (
      <>
        {summary}
        {current}
      </>
    );
  };

  const service = salon.services.find((s) => s.id === serviceId);
  return (
    <div className="mx-auto flex w-full max-w-2xl flex-col gap-5">
      <div>
        <p className="text-sm font-bold text-ink/80">{salon.name}</p>
        <h1 className="text-3xl font-extrabold tracking-tight">Book {service?.name ?? 'a service'}</h1>
      </div>
      <FlowProgress steps={flowStepsFor(user !== null)} current={step} />
      {body()}
    </div>
  );
}
