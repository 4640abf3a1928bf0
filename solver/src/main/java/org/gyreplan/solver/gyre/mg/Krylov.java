package org.gyreplan.solver.gyre.mg;

import org.gyreplan.solver.progress.CancelToken;
import org.gyreplan.solver.progress.ProgressListener;

/**
 * Right-preconditioned BiCGStab (van der Vorst 1992, SIAM J. Sci. Stat. Comput. 13, 631–644) with a multigrid
 * preconditioner, for the non-symmetric gyre operators. Inner products are summed over fixed node blocks in a fixed
 * order, so the iterates are bit-identical for any thread count.
 */
public final class Krylov {
    private static final int BLOCK = 16384;

    /** Outcome of a solve. */
    public record Result(int iterations, double relativeResidual, boolean converged) { }

    private Krylov() { }

    static double dot(double[] a, double[] b, Parallel par) {
        int n = a.length, nb = (n + BLOCK - 1) / BLOCK;
        return par.sum(nb, c -> {
            int k0 = c * BLOCK, k1 = Math.min(n, k0 + BLOCK);
            double s = 0;
            for (int k = k0; k < k1; k++) s += a[k] * b[k];
            return s;
        });
    }

    private interface Kernel { void run(int k0, int k1); }

    private static void each(int n, Parallel par, Kernel kern) {
        int nb = (n + BLOCK - 1) / BLOCK;
        par.forEach(nb, c -> kern.run(c * BLOCK, Math.min(n, c * BLOCK + BLOCK)));
    }

    /**
     * Solves A x = b. x holds the initial guess on entry and the solution on exit.
     *
     * @param tol      relative residual target ‖b − A x‖₂ / ‖b‖₂ of the recursive residual; the true residual, checked
     *                 at the end (with up to 5 restarts), must be within 10·tol (rounding floor of the biharmonic)
     * @param maxIter  iteration limit
     * @param stage    progress stage name
     */
    public static Result bicgstab(StencilMatrix A, Multigrid M, double[] b, double[] x, double tol, int maxIter,
                                  Parallel par, ProgressListener listener, CancelToken cancel, String stage) {
        // restart from the current iterate when the recursively updated residual has drifted from the true one
        int total = 0;
        Result last = null;
        for (int restart = 0; restart < 6 && total < maxIter; restart++) {
            last = run(A, M, b, x, tol, maxIter - total, par, listener, cancel, stage);
            total += last.iterations();
            if (last.converged() || last.iterations() == 0) break;
        }
        return new Result(total, last.relativeResidual(), last.converged());
    }

    private static Result run(StencilMatrix A, Multigrid M, double[] b, double[] x, double tol, int maxIter,
                              Parallel par, ProgressListener listener, CancelToken cancel, String stage) {
        int n = b.length;
        double[] r = new double[n], rh = new double[n], p = new double[n], v = new double[n];
        double[] ph = new double[n], sh = new double[n], t = new double[n];
        A.residual(b, x, r, par);
        double bnorm = Math.sqrt(dot(b, b, par));
        if (bnorm == 0.0) {
            java.util.Arrays.fill(x, 0.0);
            return new Result(0, 0.0, true);
        }
        System.arraycopy(r, 0, rh, 0, n);
        double rho = 1, alpha = 1, omega = 1;
        double res = Math.sqrt(dot(r, r, par)) / bnorm;
        double res0 = Math.max(res, tol);
        int it = 0;
        while (res > tol && it < maxIter) {
            cancel.check();
            double rhoNew = dot(rh, r, par);
            if (rhoNew == 0.0 || !Double.isFinite(rhoNew)) break;
            double beta = (rhoNew / rho) * (alpha / omega);
            final double fb = beta, fo = omega;
            each(n, par, (k0, k1) -> { for (int k = k0; k < k1; k++) p[k] = r[k] + fb * (p[k] - fo * v[k]); });
            M.precondition(p, ph);
            A.apply(ph, v, par);
            double rv = dot(rh, v, par);
            if (rv == 0.0 || !Double.isFinite(rv)) break;
            alpha = rhoNew / rv;
            final double fa = alpha;
            each(n, par, (k0, k1) -> { for (int k = k0; k < k1; k++) r[k] -= fa * v[k]; });   // r := s
            double sn = Math.sqrt(dot(r, r, par)) / bnorm;
            if (sn <= tol) {
                each(n, par, (k0, k1) -> { for (int k = k0; k < k1; k++) x[k] += fa * ph[k]; });
                res = sn;
                it++;
                break;
            }
            M.precondition(r, sh);
            A.apply(sh, t, par);
            double tt = dot(t, t, par);
            omega = tt == 0.0 ? 0.0 : dot(t, r, par) / tt;
            final double fw = omega;
            each(n, par, (k0, k1) -> {
                for (int k = k0; k < k1; k++) {
                    x[k] += fa * ph[k] + fw * sh[k];
                    r[k] -= fw * t[k];
                }
            });
            rho = rhoNew;
            res = Math.sqrt(dot(r, r, par)) / bnorm;
            it++;
            double frac = Math.log(res0 / Math.max(res, 1e-300)) / Math.log(res0 / tol);
            listener.progress(stage, Math.max(0, Math.min(1, frac)),
                    String.format("iteration %d, relative residual %.2e", it, res));
            if (omega == 0.0) break;
        }
        // true residual
        A.residual(b, x, r, par);
        double trueRes = Math.sqrt(dot(r, r, par)) / bnorm;
        return new Result(it, trueRes, trueRes <= 10 * tol);
    }

}
