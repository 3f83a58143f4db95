package org.tertius.connection;

import org.apfloat.Apcomplex;
import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tertius.connection.match.DecayingConnection;
import org.tertius.connection.match.ZeroFit;
import org.tertius.connection.num.ApcomplexArith;
import org.tertius.connection.num.Arith;
import org.tertius.core.step.SolverSettings;

class ScratchTest {
    @Test
    void scratch() {
        for (double lam : new double[] {0.1, 0.2, 0.3}) {
            double sig = 2 / Math.PI * Math.asin(Math.PI * lam);
            double b = Math.pow(2, -2 * sig) * org.hipparchus.special.Gamma.gamma((1 - sig) / 2)
                    / org.hipparchus.special.Gamma.gamma((1 + sig) / 2);
            long t0 = System.nanoTime();
            ZeroFit.Result<Complex> r = DecayingConnection.zeroDataByEngine(lam, 1e-3,
                    SolverSettings.builder().tolerance(1e-16).build());
            long t1 = System.nanoTime();
            ZeroFit.Result<Complex> r2 = DecayingConnection.zeroData(Arith.DOUBLE, new Complex(lam), 1e-3, 40);
            long t2 = System.nanoTime();
            System.out.printf("lam %g engine: sig %.17g (%.2e, est %.1e) B %.17g (%.2e, est %.1e) %d ms%n", lam,
                    r.sigma().getReal(), r.sigma().getReal() - sig, r.errSigma(), r.amplitude().getReal(),
                    r.amplitude().getReal() - b, r.errAmplitude(), (t1 - t0) / 1000000);
            System.out.printf("   taylor: sig %.17g (%.2e, est %.1e) B %.17g (%.2e, est %.1e) %d ms%n",
                    r2.sigma().getReal(), r2.sigma().getReal() - sig, r2.errSigma(), r2.amplitude().getReal(),
                    r2.amplitude().getReal() - b, r2.errAmplitude(), (t2 - t1) / 1000000);
        }
    }
}
