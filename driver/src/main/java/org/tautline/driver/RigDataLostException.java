package org.tautline.driver;

/**
 * Samples of a read were lost on the way, but the rig and its link are healthy and the output is as it was.
 *
 * <p>Thrown by {@link org.tautline.driver.spi.Acquisition#read(int)} when a read cannot deliver contiguous,
 * verified samples (for example a damaged block the device no longer keeps for a resend). The sweep treats
 * it as "measure this step again": the step in progress is discarded, never recorded, and repeated; the
 * next read starts at whatever sample comes next. Any other {@link RigException} from a read is a fault
 * that ends the sweep.
 */
public class RigDataLostException extends RigException {
    private static final long serialVersionUID = 1L;

    /** @param message what was lost, where (port, block, sample index) and what was expected */
    public RigDataLostException(String message) {
        super(message);
    }

    /**
     * @param message what was lost, where and what was expected
     * @param cause the underlying cause
     */
    public RigDataLostException(String message, Throwable cause) {
        super(message, cause);
    }
}
