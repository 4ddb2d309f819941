package org.tautline.driver.sweep;

import java.util.List;
import java.util.OptionalDouble;

import org.hipparchus.complex.Complex;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfQuantity;
import org.tautline.analysis.modal.ModalEstimate;
import org.tautline.analysis.modal.Mode;

/**
 * Finds a step that stands alone far off a local modal fit: a disturbed step, not a feature of the response.
 *
 * <p>With each line's variance known, the whitened residual e_k = (H_k - H_model,k)/sigma_k of a correct model is
 * circular unit-variance noise, so |e_k|^2 is exponential with mean 1 and P(|e_k| &gt; {@link #OUTLIER_SIGMAS}) =
 * exp(-64), never by chance (S. M. Kay, Fundamentals of Statistical Signal Processing: Detection Theory, 1998,
 * ch. 2, from memory). A model that cannot follow the response (a level-dependent frequency, a mode missed) leaves
 * large residuals too, but on runs of neighbouring lines; a single step disturbed by a transient (a start from rest,
 * ringing left from elsewhere, a knock) stands alone. So a line is taken as disturbed only when its residual is above
 * {@link #OUTLIER_SIGMAS} and {@link #ISOLATION_RATIO} times both its neighbours'. Rejecting such a step and measuring
 * it again is common practice; the thresholds are our choice.
 */
final class FitResiduals {
    /** Whitened residual a disturbed line exceeds. */
    static final double OUTLIER_SIGMAS = 8.0;
    /** ... and the factor by which it exceeds both neighbours' residuals. */
    static final double ISOLATION_RATIO = 5.0;

    private FitResiduals() {
    }

    /**
     * @param frf the fitted FRF with its per-line variance, any quantity
     * @param estimate the fit of it
     * @return the frequency of the line that stands alone far off the fit, Hz, if there is one (the worst)
     */
    static OptionalDouble isolatedOutlierHz(Frf frf, ModalEstimate estimate) {
        Frf h = frf.toQuantity(FrfQuantity.RECEPTANCE);
        if (h.variance().isEmpty() || estimate.modes().isEmpty()) {
            return OptionalDouble.empty();
        }
        double[] variance = h.variance().get();
        List<Mode> modes = estimate.plainModes();
        int n = h.size();
        double[] e = new double[n];
        for (int k = 0; k < n; k++) {
            double f = h.frequencyHz(k);
            if (f < estimate.bandLowHz() || f > estimate.bandHighHz() || !(variance[k] > 0)) {
                e[k] = Double.NaN;
                continue;
            }
            Complex model = estimate.residualTerms().receptanceAt(f);
            for (Mode m : modes) {
                model = model.add(m.receptanceAt(f));
            }
            e[k] = h.value(k).subtract(model).norm() / Math.sqrt(variance[k]);
        }
        int worst = -1;
        for (int k = 1; k + 1 < n; k++) {
            boolean alone = e[k] > OUTLIER_SIGMAS && !(e[k - 1] * ISOLATION_RATIO >= e[k])
                    && !(e[k + 1] * ISOLATION_RATIO >= e[k]);
            if (alone && (worst < 0 || e[k] > e[worst])) {
                worst = k;
            }
        }
        return worst < 0 ? OptionalDouble.empty() : OptionalDouble.of(h.frequencyHz(worst));
    }
}
