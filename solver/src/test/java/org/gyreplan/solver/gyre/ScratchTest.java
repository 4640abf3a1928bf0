package org.gyreplan.solver.gyre;

import org.gyreplan.solver.PhysicalConstants;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.progress.CancelToken;
import org.gyreplan.solver.progress.ProgressListener;
import org.junit.jupiter.api.Test;

class ScratchTest {
    @Test
    void run() {
        double lam = 1e7, b = 2 * Math.PI * 1e6, F = 0.1, r = 1e-6, beta = 1e-11, rho = 1000;
        for (int nxo : new int[] {127, 255, 511, 1023}) {
            int nyo = (nxo + 1) / 4 - 1;
            LonLatGrid g = GyreTestSupport.rectangle(nxo, nyo, lam, b);
            var curl = GyreTestSupport.curlXY(g, (x, y) -> -F * Math.PI / b * Math.sin(Math.PI * y / b));
            GyreProblem p = GyreProblem.on(g).curl(curl).constants(PhysicalConstants.DEFAULT.withRho0(rho))
                    .stommel(r).depth(200).geometry(Geometry.betaPlane(0, beta)).build();
            long t0 = System.nanoTime();
            GyreSolution s = GyreSolver.solve(p, ProgressListener.NONE, CancelToken.none());
            long t1 = System.nanoTime();
            double err = 0, mx = 0;
            for (int j = 1; j <= nyo; j++) for (int i = 1; i <= nxo; i++) {
                double ex = GyreTestSupport.stommel(GyreTestSupport.x(g, i), GyreTestSupport.y(g, j), lam, b, F, r, beta, rho) * 1e-6;
                double v = s.streamfunction().at(i, j);
                err = Math.max(err, Math.abs(v - ex));
                mx = Math.max(mx, v);
            }
            System.out.printf("n=%d err=%.3e max=%.5f it=%s lv=%d t=%.3fs warn=%s%n", nxo, err, mx,
                    java.util.Arrays.toString(s.stats().iterations()), s.stats().levels(), (t1 - t0) / 1e9, s.warnings());
        }
    }
}
