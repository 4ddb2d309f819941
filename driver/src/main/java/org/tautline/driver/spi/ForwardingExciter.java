package org.tautline.driver.spi;

/**
 * An exciter that passes every call to another; extend it to watch or change one call without writing out
 * the others.
 */
public class ForwardingExciter implements Exciter {
    private final Exciter inner;

    /** @param inner the exciter every call goes to */
    public ForwardingExciter(Exciter inner) {
        this.inner = inner;
    }

    @Override
    public void setSine(double frequencyHz, double amplitudeV) {
        inner.setSine(frequencyHz, amplitudeV);
    }

    @Override
    public void rampTo(double amplitudeV, double durationS) {
        inner.rampTo(amplitudeV, durationS);
    }

    @Override
    public void setOutputEnabled(boolean enabled) {
        inner.setOutputEnabled(enabled);
    }

    @Override
    public boolean isOutputEnabled() {
        return inner.isOutputEnabled();
    }

    @Override
    public double maxAmplitudeV() {
        return inner.maxAmplitudeV();
    }

    @Override
    public boolean switchOffNow() {
        return inner.switchOffNow();
    }
}
