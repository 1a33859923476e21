package org.nullpath.link;

import org.nullpath.lightcone.LightCone;
import org.nullpath.lightcone.MotionFactor;
import org.nullpath.lightcone.SignalPath;
import org.nullpath.units.Constants;
import org.nullpath.worldline.State;
import org.nullpath.worldline.Worldline;

/**
 * How fast the Doppler factor changes on the receiver's clock, dD / d(tau_rx).
 *
 * <p>When the photon runs along both bodies' lines of motion (the flight-line case), D =
 * exp(-(mu_r eta_r - mu_s eta_s)) with mu = +-1, d(eta)/d(tau) = a / c and d(tau_s)/d(tau_r) = D, so
 * <pre>  dD/d(tau_r) = -D (mu_r a_r - mu_s a_s D) / c</pre>
 * exactly. Otherwise (off the line) it is a five-point central difference of D - 1 over the send
 * clock, times D, with a step of 1e-4 of the shorter of the light time and c / |a|; its truncation
 * error is of order (step / scale)^4 ~ 1e-16 relative and its rounding error about 1e-11 relative. Next to a
 * horizon, where the later sends never arrive, a backward difference of second order is used instead
 * (truncation about (step / scale)^2 ~ 1e-8). Across a leg boundary the rate jumps; the stencil then
 * blends the two legs' values within 2 steps of it.
 */
public final class DopplerRate {
    private DopplerRate() {
    }

    /** dD / d(receiver clock), per second, for a delivered signal. */
    public static double of(Worldline sender, Worldline receiver, SignalPath p, Doppler.Factor d) {
        double aS = sender.properAccelerationAt(p.send().timeSeconds());
        double aR = receiver.properAccelerationAt(p.receive().timeSeconds());
        double muS = alignment(p.send(), aS, p);
        double muR = alignment(p.receive(), aR, p);
        if (!Double.isNaN(muS) && !Double.isNaN(muR)) {
            return -d.doppler() * (muR * aR - muS * aS * d.doppler()) / Constants.C;
        }
        double scale = Math.max(p.lightTimeSeconds(), 1.0);
        double amax = Math.max(Math.abs(aS), Math.abs(aR));
        if (amax > 0) {
            scale = Math.min(scale, Constants.C / amax);
        }
        double tau = p.send().clock();
        double h = Math.max(1e-4 * scale, 1e4 * Math.ulp(tau));
        double fm2 = offsetAt(sender, receiver, tau - 2 * h);
        double fm1 = offsetAt(sender, receiver, tau - h);
        double fp1 = offsetAt(sender, receiver, tau + h);
        double fp2 = offsetAt(sender, receiver, tau + 2 * h);
        double dDdTauS;
        if (Double.isNaN(fp1) || Double.isNaN(fp2)) {
            // the later sends lie beyond a horizon: a one-sided (backward) difference of second order
            dDdTauS = (3 * d.offset() - 4 * fm1 + fm2) / (2 * h);
        } else {
            dDdTauS = (fm2 - 8 * fm1 + 8 * fp1 - fp2) / (12 * h);
        }
        return dDdTauS * d.doppler();
    }

    private static double offsetAt(Worldline sender, Worldline receiver, double clock) {
        SignalPath q = LightCone.future(sender.atClock(clock), receiver);
        if (!q.delivered()) {
            return Double.NaN;
        }
        return Doppler.of(q).offset();
    }

    /**
     * +1 or -1 when the body moves and accelerates exactly along (or against) the photon; 0 for a body
     * at rest and unaccelerated (its factor is 1 throughout); NaN when the photon crosses its line of
     * motion at an angle.
     */
    private static double alignment(State s, double a, SignalPath p) {
        if (s.rapidity() == 0 && a == 0) {
            return 0;
        }
        if (p.path().isZero()) {
            return 1;
        }
        if (MotionFactor.alongLine(s.direction(), p.path().unit())) {
            return Math.signum(s.direction().dot(p.path()));
        }
        return Double.NaN;
    }
}
