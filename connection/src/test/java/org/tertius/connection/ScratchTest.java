package org.tertius.connection;

import org.apfloat.Apcomplex;
import org.junit.jupiter.api.Test;
import org.tertius.connection.match.DecayingConnection;
import org.tertius.connection.match.ZeroFit;
import org.tertius.connection.num.ApcomplexArith;

class ScratchTest {
    @Test
    void scratch() {
        ApcomplexArith ar = new ApcomplexArith(36);
        long t0 = System.nanoTime();
        ZeroFit.Result<Apcomplex> r = DecayingConnection.zeroData(ar, ar.parse("0.2"), 1e-4, 12);
        System.out.println(r.sigma() + " " + r.errSigma() + " " + r.amplitude() + " " + r.errAmplitude() + " "
                + (System.nanoTime() - t0) / 1000000 + " ms");
    }
}
