package org.tautline.driver.sim;

/** Measures how much faster than real time the simulated rig runs. */
public final class SimulatorBenchmark {
    private SimulatorBenchmark() {
    }

    /**
     * The figures of one benchmark run.
     *
     * @param simulatedS rig time simulated, s
     * @param wallS wall-clock time it took, s
     * @param realTimeMultiple simulatedS / wallS
     * @param modeCount harmonics per polarisation simulated
     * @param sampleRateHz acquisition sample rate, Hz
     */
    public record Figures(double simulatedS, double wallS, double realTimeMultiple, int modeCount,
                          double sampleRateHz) {
    }

    /**
     * Drives a fresh rig at 1 V near its fundamental and acquires the given span in 0.1 s blocks.
     *
     * <p>A first span of the same length runs untimed to let the JIT compile the inner loop.
     *
     * @param config the rig to time
     * @param simulatedS rig time to simulate (and time), s, positive
     * @return the figures
     */
    public static Figures run(SimulationConfig config, double simulatedS) {
        Checks.positive("SimulatorBenchmark", "simulatedS", simulatedS, "s");
        SimulatedRig rig = new SimulatedRig(config);
        double driveV = Math.min(1.0, config.maxDriveV());
        double frequencyHz = rig.truth().modes().get(0).mode().frequencyHz();
        rig.exciter().setSine(frequencyHz, driveV);
        rig.exciter().setOutputEnabled(true);
        long samples = Math.max(1, Math.round(simulatedS * config.sampleRateHz()));
        acquire(rig, samples, config.sampleRateHz());
        long start = System.nanoTime();
        acquire(rig, samples, config.sampleRateHz());
        double wallS = (System.nanoTime() - start) * 1e-9;
        rig.close();
        double spanS = samples / config.sampleRateHz();
        return new Figures(spanS, wallS, spanS / wallS, config.specimen().modeCount(), config.sampleRateHz());
    }

    private static void acquire(SimulatedRig rig, long samples, double sampleRateHz) {
        int block = (int) Math.max(1, Math.round(0.1 * sampleRateHz));
        long left = samples;
        while (left > 0) {
            int now = (int) Math.min(block, left);
            rig.acquisition().read(now);
            left -= now;
        }
    }

    /**
     * Prints the figures for the demo wire over 20 s of rig time.
     *
     * @param args ignored
     */
    public static void main(String[] args) {
        Figures f = run(SimulationConfigs.demoWire(), 20.0);
        System.out.printf("simulated %.1f s in %.3f s wall: %.0f x real time (%d modes x 2 polarisations, %.0f S/s)%n",
                f.simulatedS(), f.wallS(), f.realTimeMultiple(), f.modeCount(), f.sampleRateHz());
    }
}
