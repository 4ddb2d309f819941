package org.tautline.driver.sim;

/**
 * Time-stepping of specimen, shaker armature and accelerometer mass joined by rigid constraints.
 *
 * <p>Each modal coordinate and the armature advance by their exact state-transition matrices
 * (exact discretisation of a linear oscillator, e.g. G. F. Franklin, J. D. Powell and M. L. Workman,
 * Digital Control of Dynamic Systems, 3rd ed., Addison-Wesley 1998, ch. 4, from memory). The rigid
 * stinger (armature displacement = specimen drive-direction displacement at x_f) and, if present,
 * the accelerometer mass (its two displacements = the specimen's at x_s) are enforced as in the
 * RATTLE method (H. C. Andersen, J. Comput. Phys. 52:24-34, 1983, from memory) with the exact flows
 * in place of the free drift: an impulse at the start of each step, found from a small linear solve
 * so the positions agree at the step's end, and a velocity projection at the end. Both solves use
 * constant precomputed matrices, so a step is a few passes over plain arrays. Because the specimen
 * sees only impulses at the step instants, the sampled response over the sampled transmitted force
 * is the impulse-invariant image of the continuous receptance (A. V. Oppenheim and R. W. Schafer,
 * Discrete-Time Signal Processing, 3rd ed., Pearson 2010, section 7.2, from memory): it differs from it
 * only by the aliased images sum over l != 0 of H(w + l w_s). Above every mode each image is close to
 * the mass line -S/(w + l w_s)^2 with S the sum of the modal constants, and sum over l != 0 of
 * 1/(l w_s)^2 = pi^2/(3 w_s^2); the displacement output adds S pi^2/(3 w_s^2) times the force to
 * cancel that leading part, leaving an error of order (f/f_step)^2 smaller still. The Kirchhoff-Carrier
 * tension is applied
 * explicitly from the previous step. Not thread-safe; the rig serialises access.
 */
final class RigDynamics {
    private final int n;
    private final int m;
    private final double h;
    private final double[] a11;
    private final double[] a12;
    private final double[] a21;
    private final double[] a22;
    private final double[][] g;
    private final double[][] beta;
    private final double[][] delta;
    private final double[] sensor;
    private final double[] kappa;
    private final double[][] positionSolve;
    private final double[][] velocityCoupling;
    private final double[][] velocitySolve;
    private final double[] bodyInverseMass;
    private final double[] bodyPositionGain;
    private final double[] bodyVelocityGain;
    private final double arm11;
    private final double arm12;
    private final double arm21;
    private final double arm22;
    private final double driveForcePerV;
    private final double forceConstant;
    private final double resistance;
    private final double distortion2;
    private final double distortion3;
    private final double tensionGainPerQ2;
    private final double inverseLinearDensity;
    private final boolean nonlinear;
    private final boolean acceleration;
    private final double aliasCorrection;

    private final double[] qf;
    private final double[] vf;
    private final double[] lambda;
    private final double[] mu;
    private final double[] bodyPosition;
    private final double[] bodyVelocity;
    private final double[] residual;
    private final double[] velocityResidual;
    private final double[] sums = new double[4];
    private double extraTensionN;
    private double displacementBack1;
    private double displacementBack2;
    private double forceBack1;
    private double forceN;
    private double response;

    RigDynamics(SimulationConfig config, ModalModel model, double stepS) {
        SimulatedSpecimen specimen = config.specimen();
        ShakerModel shaker = config.shaker();
        double accelerometerKg = config.sensors().accelerometerMassKg();
        n = model.dofCount;
        m = accelerometerKg > 0 ? 3 : 1;
        h = stepS;
        a11 = new double[n];
        a12 = new double[n];
        a21 = new double[n];
        a22 = new double[n];
        for (int i = 0; i < n; i++) {
            double w = model.omega(i);
            double z = model.dampingRatio[i];
            double wd = w * Math.sqrt(1.0 - z * z);
            double decay = Math.exp(-z * w * h);
            double c = Math.cos(wd * h);
            double s = Math.sin(wd * h);
            a11[i] = decay * (c + z * w / wd * s);
            a12[i] = decay * s / wd;
            a21[i] = -decay * w * w / wd * s;
            a22[i] = decay * (c - z * w / wd * s);
        }
        g = new double[m][];
        g[0] = model.driveProjection.clone();
        if (m == 3) {
            g[1] = model.sensorPointDrive.clone();
            g[2] = model.sensorPointCross.clone();
        }
        beta = new double[m][n];
        delta = new double[m][n];
        for (int j = 0; j < m; j++) {
            for (int i = 0; i < n; i++) {
                beta[j][i] = a12[i] * g[j][i];
                delta[j][i] = a22[i] * g[j][i];
            }
        }
        sensor = model.sensorProjection.clone();
        kappa = model.wavenumberSquared.clone();
        double[][] arm = StateTransition.oscillator(shaker.movingMassKg(), shaker.suspensionStiffnessNPerM(),
                shaker.suspensionDampingNsPerM() + shaker.backEmfDampingNsPerM(), h);
        arm11 = arm[0][0];
        arm12 = arm[0][1];
        arm21 = arm[1][0];
        arm22 = arm[1][1];
        bodyInverseMass = new double[m];
        bodyPositionGain = new double[m];
        bodyVelocityGain = new double[m];
        bodyInverseMass[0] = 1.0 / shaker.movingMassKg();
        bodyPositionGain[0] = arm12 * bodyInverseMass[0];
        bodyVelocityGain[0] = arm22 * bodyInverseMass[0];
        for (int j = 1; j < m; j++) {
            bodyInverseMass[j] = 1.0 / accelerometerKg;
            bodyPositionGain[j] = h * bodyInverseMass[j];
            bodyVelocityGain[j] = bodyInverseMass[j];
        }
        double[][] position = new double[m][m];
        velocityCoupling = new double[m][m];
        double[][] velocity = new double[m][m];
        for (int j = 0; j < m; j++) {
            for (int l = 0; l < m; l++) {
                double sp = 0;
                double sv = 0;
                double sk = 0;
                for (int i = 0; i < n; i++) {
                    double gg = g[j][i] * g[l][i];
                    sp += a12[i] * gg;
                    sv += a22[i] * gg;
                    sk += gg;
                }
                position[j][l] = sp + (j == l ? bodyPositionGain[j] : 0.0);
                velocityCoupling[j][l] = sv + (j == l ? bodyVelocityGain[j] : 0.0);
                velocity[j][l] = sk + (j == l ? bodyInverseMass[j] : 0.0);
            }
        }
        positionSolve = StateTransition.inverse(position);
        velocitySolve = StateTransition.inverse(velocity);
        driveForcePerV = shaker.forceConstantNPerA() / shaker.coilResistanceOhm();
        forceConstant = shaker.forceConstantNPerA();
        resistance = shaker.coilResistanceOhm();
        double referenceCurrentA = config.maxDriveV() / shaker.coilResistanceOhm();
        distortion2 = 2.0 * shaker.secondHarmonicDistortion() / referenceCurrentA;
        distortion3 = 4.0 * shaker.thirdHarmonicDistortion() / (referenceCurrentA * referenceCurrentA);
        nonlinear = specimen.geometricNonlinearity();
        inverseLinearDensity = 1.0 / specimen.linearDensityKgPerM();
        tensionGainPerQ2 = specimen.axialStiffnessN() / (2.0 * specimen.lengthM()) * inverseLinearDensity;
        acceleration = config.sensors().responseSensor() == ResponseSensor.ACCELERATION;
        double modalConstantSum = 0;
        for (int i = 0; i < n; i++) {
            modalConstantSum += sensor[i] * g[0][i];
        }
        double stepRateRadPerS = 2.0 * Math.PI / h;
        aliasCorrection = m == 1 && !acceleration
                ? modalConstantSum * Math.PI * Math.PI / (3.0 * stepRateRadPerS * stepRateRadPerS) : 0.0;
        qf = new double[n];
        vf = new double[n];
        lambda = new double[m];
        mu = new double[m];
        bodyPosition = new double[m];
        bodyVelocity = new double[m];
        residual = new double[m];
        velocityResidual = new double[m];
    }

    /**
     * Advances one internal step from t_k to t_k + h under the drive voltage V(t_k).
     *
     * <p>Afterwards {@link #forceN()} and {@link #response()} hold the transducer values at t_k.
     *
     * @param driveV coil voltage at the step's start, V
     */
    void step(double driveV) {
        double kick = nonlinear ? h * extraTensionN * inverseLinearDensity : 0.0;
        double displacement = 0;
        double stretch = 0;
        for (int j = 0; j < m; j++) {
            residual[j] = 0;
            velocityResidual[j] = 0;
        }
        if (m == 1) {
            stepSingleConstraint(kick);
            finishSingleConstraint(driveV);
            return;
        } else {
            for (int i = 0; i < n; i++) {
                double q = qf[i];
                double v = vf[i];
                for (int j = 0; j < m; j++) {
                    q += beta[j][i] * lambda[j];
                    v += delta[j][i] * lambda[j] + g[j][i] * mu[j];
                }
                double c = sensor[i];
                displacement += c * q;
                double kq = kappa[i] * q;
                stretch += kq * q;
                v -= kick * kq;
                double qn = a11[i] * q + a12[i] * v;
                double vn = a21[i] * q + a22[i] * v;
                for (int j = 0; j < m; j++) {
                    residual[j] += g[j][i] * qn;
                    velocityResidual[j] += g[j][i] * vn;
                }
                qf[i] = qn;
                vf[i] = vn;
            }
        }
        double forceAtStart = mu[0];
        advanceBodies(driveV);
        for (int j = 0; j < m; j++) {
            double sum = 0;
            for (int l = 0; l < m; l++) {
                sum += positionSolve[j][l] * (bodyPosition[l] - residual[l]);
            }
            lambda[j] = sum;
        }
        for (int j = 0; j < m; j++) {
            bodyPosition[j] -= bodyPositionGain[j] * lambda[j];
            bodyVelocity[j] -= bodyVelocityGain[j] * lambda[j];
            double coupled = 0;
            for (int l = 0; l < m; l++) {
                coupled += velocityCoupling[j][l] * lambda[l];
            }
            // velocityCoupling already includes the body's share, so undo it from the body side once.
            velocityResidual[j] += coupled - bodyVelocityGain[j] * lambda[j];
        }
        for (int j = 0; j < m; j++) {
            double sum = 0;
            for (int l = 0; l < m; l++) {
                sum += velocitySolve[j][l] * (bodyVelocity[l] - velocityResidual[l]);
            }
            mu[j] = sum;
        }
        for (int j = 0; j < m; j++) {
            bodyVelocity[j] -= bodyInverseMass[j] * mu[j];
        }
        forceN = (forceAtStart + lambda[0]) / h;
        response = displacement;
        if (acceleration) {
            delayAndDifferentiate();
        }
        extraTensionN = nonlinear ? tensionGainPerQ2 * stretch : 0.0;
    }

    /**
     * The modal pass for the stinger-only case, two coordinates (both polarisations of one harmonic) per
     * iteration with separate partial sums so the additions do not wait on each other.
     */
    private void stepSingleConstraint(double kick) {
        double[] g0 = g[0];
        double[] b0 = beta[0];
        double[] d0 = delta[0];
        double l0 = lambda[0];
        double u0 = mu[0];
        double dispA = 0;
        double dispB = 0;
        double strA = 0;
        double strB = 0;
        double rA = 0;
        double rB = 0;
        double sA = 0;
        double sB = 0;
        for (int i = 0; i < n; i += 2) {
            int k = i + 1;
            double qa = qf[i] + b0[i] * l0;
            double qb = qf[k] + b0[k] * l0;
            double va = vf[i] + d0[i] * l0 + g0[i] * u0;
            double vb = vf[k] + d0[k] * l0 + g0[k] * u0;
            double ca = sensor[i];
            double cb = sensor[k];
            dispA += ca * qa;
            dispB += cb * qb;
            double kqa = kappa[i] * qa;
            double kqb = kappa[k] * qb;
            strA += kqa * qa;
            strB += kqb * qb;
            va -= kick * kqa;
            vb -= kick * kqb;
            double qna = a11[i] * qa + a12[i] * va;
            double qnb = a11[k] * qb + a12[k] * vb;
            double vna = a21[i] * qa + a22[i] * va;
            double vnb = a21[k] * qb + a22[k] * vb;
            rA += g0[i] * qna;
            rB += g0[k] * qnb;
            sA += g0[i] * vna;
            sB += g0[k] * vnb;
            qf[i] = qna;
            qf[k] = qnb;
            vf[i] = vna;
            vf[k] = vnb;
        }
        residual[0] = rA + rB;
        velocityResidual[0] = sA + sB;
        sums[0] = dispA + dispB;
        sums[2] = strA + strB;
    }

    /** The constraint solves and outputs for the stinger-only case, in scalars. */
    private void finishSingleConstraint(double driveV) {
        double forceAtStart = mu[0];
        advanceBodies(driveV);
        double l0 = positionSolve[0][0] * (bodyPosition[0] - residual[0]);
        double y = bodyPosition[0] - bodyPositionGain[0] * l0;
        double vy = bodyVelocity[0] - bodyVelocityGain[0] * l0;
        double stringVelocity = velocityResidual[0] + (velocityCoupling[0][0] - bodyVelocityGain[0]) * l0;
        double u0 = velocitySolve[0][0] * (vy - stringVelocity);
        bodyPosition[0] = y;
        bodyVelocity[0] = vy - bodyInverseMass[0] * u0;
        lambda[0] = l0;
        mu[0] = u0;
        double impulse = forceAtStart + l0;
        forceN = impulse / h;
        if (acceleration) {
            response = sums[0];
            delayAndDifferentiate();
        } else {
            response = sums[0] + aliasCorrection * forceN;
        }
        extraTensionN = nonlinear ? tensionGainPerQ2 * sums[2] : 0.0;
    }

    /**
     * Turns the sensor displacement into acceleration by the central second difference over internal steps.
     *
     * <p>The result belongs to the previous step instant, so the force is delayed by one step as well;
     * the relative error of the second difference at frequency f is (2 pi f h)^2 / 12.
     */
    private void delayAndDifferentiate() {
        double a = (response - 2.0 * displacementBack1 + displacementBack2) / (h * h);
        displacementBack2 = displacementBack1;
        displacementBack1 = response;
        response = a;
        double delayed = forceBack1;
        forceBack1 = forceN;
        forceN = delayed;
    }

    /** Kicks the armature with the coil force over the step and lets armature and accelerometer mass run free. */
    private void advanceBodies(double driveV) {
        double velocity = bodyVelocity[0];
        double currentA = (driveV - forceConstant * velocity) / resistance;
        double impulse = h * (driveForcePerV * driveV
                + forceConstant * currentA * currentA * (distortion2 + distortion3 * currentA));
        velocity += impulse * bodyInverseMass[0];
        double y = bodyPosition[0];
        bodyPosition[0] = arm11 * y + arm12 * velocity;
        bodyVelocity[0] = arm21 * y + arm22 * velocity;
        for (int j = 1; j < m; j++) {
            bodyPosition[j] += h * bodyVelocity[j];
        }
    }

    /** @return force into the specimen at the last step's start, N */
    double forceN() {
        return forceN;
    }

    /** @return response (displacement m or acceleration m/s^2) at the last step's start */
    double response() {
        return response;
    }

    /** @return the Kirchhoff-Carrier tension increase at the last step's start, N */
    double extraTensionN() {
        return extraTensionN;
    }
}
