package org.tautline.driver.sweep;

import org.hipparchus.complex.Complex;

/**
 * Decides when a step has reached steady state, from successive whole-cycle block phasors and the time constant.
 *
 * <p>After a change of drive frequency or level, a lightly damped mode adds a free transient that decays as
 * exp(-zeta w_n t) (the single-degree-of-freedom transient response: S. S. Rao, Mechanical Vibrations, 5th
 * ed., Prentice Hall 2011, ch. 3-4, from memory), so with tau = 1/(zeta w_n) it falls to 1 % in
 * ln(100) tau = 4.6 tau (common practice: dwell 5-7 tau of the slowest nearby mode). Fitted over
 * successive blocks of length T, the block phasors are P_k = S + c q^k e^{j theta k} with S the steady state
 * and q = exp(-T/tau): the transient rotates (it rings at the mode's frequency, not the drive's) and
 * shrinks by q per block. Since |q e^{j theta} - 1| >= 1 - q, the transient left in block k is at most
 * |P_k - P_{k-1}| q / (1 - q): a bound from the measured convergence and the damping estimate together.
 * A step is settled when that bound, less a noise allowance of three standard errors of the difference,
 * is within {@code tolerance |P_k|} on two blocks running, so a small step (a fine refinement, a small
 * level change) settles in a few blocks while a large one waits its full 4.6 tau. A cap of
 * {@link #CAP_FACTOR} times ln(1/tolerance) tau ends a step whose phasors never converge (noise,
 * a nonlinearity), reported as {@link SettleState#TIMED_OUT}.
 */
public final class SettleDetector {
    /** The settle cap, as a multiple of the expected settle time ln(1/tolerance) tau. */
    public static final double CAP_FACTOR = 2.0;
    /** Standard errors of a phasor difference allowed for noise. */
    private static final double NOISE_SIGMAS = 3.0;

    private final double tolerance;
    private final double q;
    private final double capS;
    private Complex previous;
    private int quietBlocks;
    private double elapsedS;
    private SettleState state = SettleState.SETTLING;

    /**
     * @param tolerance accepted remaining transient relative to the steady state (0.01 = 1 %)
     * @param tauS time constant of the slowest mode near the step, s
     * @param blockS length of each block fed, s
     */
    public SettleDetector(double tolerance, double tauS, double blockS) {
        this.tolerance = tolerance;
        this.q = Math.exp(-blockS / tauS);
        this.capS = CAP_FACTOR * Math.log(1.0 / tolerance) * tauS;
    }

    /**
     * Block length for a step: about half a time constant in whole drive cycles, at least 4 cycles.
     *
     * @param tauS time constant, s
     * @param frequencyHz drive frequency, Hz
     * @return the block length, whole cycles
     */
    public static int blockCycles(double tauS, double frequencyHz) {
        return (int) Math.max(4, Math.round(0.5 * tauS * frequencyHz));
    }

    /**
     * Feeds the next block's phasor.
     *
     * @param phasor the block's value: an FRF value (a ratio, free of the time origin), or a channel phasor
     *        referred to one time origin for all blocks
     * @param phasorStd standard error of the phasor's magnitude (0 for noise-free data)
     * @param blockS the block's length, s
     * @return the state after this block
     */
    public SettleState feed(Complex phasor, double phasorStd, double blockS) {
        elapsedS += blockS;
        if (previous != null) {
            double change = phasor.subtract(previous).norm();
            double noise = NOISE_SIGMAS * Math.sqrt(2.0) * phasorStd;
            double bound = Math.max(0.0, change - noise) * q / (1.0 - q);
            quietBlocks = bound <= tolerance * phasor.norm() ? quietBlocks + 1 : 0;
        }
        previous = phasor;
        if (quietBlocks >= 2) {
            state = SettleState.SETTLED;
        } else if (elapsedS >= capS) {
            state = SettleState.TIMED_OUT;
        }
        return state;
    }

    /** @return the current state */
    public SettleState state() {
        return state;
    }

    /** @return true once settled or timed out */
    public boolean done() {
        return state != SettleState.SETTLING;
    }
}
