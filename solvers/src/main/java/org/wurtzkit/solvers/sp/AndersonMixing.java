// SPDX-License-Identifier: Apache-2.0
// Copyright 2026 The wurtzkit developers
package org.wurtzkit.solvers.sp;

/**
 * Anderson mixing of the outer Schroedinger-Poisson fixed point x = G(x), where x is the potential
 * at which the subbands are computed and G(x) the potential Newton-Poisson returns with those
 * subbands (D. G. Anderson, J. ACM 12, 547 (1965); in the form analysed by H. F. Walker and P. Ni,
 * SIAM J. Numer. Anal. 49, 1715 (2011), with depth m and mixing parameter beta).
 *
 * <p>With residuals f_j = G(x_j) - x_j and the differences of the last m iterates,
 * dF = [f_{j+1} - f_j], dX = [x_{j+1} - x_j], the next input is
 * x_{k+1} = x_k + beta f_k - (dX + beta dF) gamma, gamma = argmin |f_k - dF gamma|_2.
 * The m x m least-squares problem is solved by its normal equations with Gaussian elimination and
 * partial pivoting; a pivot below {@link #RELATIVE_PIVOT} of the largest diagonal drops the oldest
 * columns until it passes (the ill-conditioned directions carry no information). The history is
 * restarted, as Walker and Ni recommend for a non-contractive start, whenever the residual grows by
 * more than {@link #RESTART_GROWTH}. Every update is a linear combination whose coefficients sum to
 * one, so Dirichlet values (residual zero) stay where they are.
 *
 * <p>O(N m^2) per update on arrays allocated once; one instance per solve, not thread-safe.
 */
final class AndersonMixing {
    /** Relative size below which a pivot of the normal equations counts as singular. */
    static final double RELATIVE_PIVOT = 1e-12;
    /** Growth of |f| from one iteration to the next that restarts the history. */
    static final double RESTART_GROWTH = 2;

    private final int n;
    private final int depth;
    private final double beta;
    private final double[][] dF;
    private final double[][] dX;
    private final double[] lastX;
    private final double[] lastF;
    private final double[] f;
    private final double[][] normal;
    private final double[] rhs;
    private final double[] gamma;
    private int stored;
    private int head;
    private boolean hasLast;
    private double lastNorm;
    private int restarts;

    /**
     * @param n     nodes
     * @param depth m, differences kept (at least 1)
     * @param beta  mixing parameter in (0, 1]
     */
    AndersonMixing(int n, int depth, double beta) {
        this.n = n;
        this.depth = depth;
        this.beta = beta;
        dF = new double[depth][n];
        dX = new double[depth][n];
        lastX = new double[n];
        lastF = new double[n];
        f = new double[n];
        normal = new double[depth][depth + 1];
        rhs = new double[depth];
        gamma = new double[depth];
    }

    /** {@return how many times the history was restarted} */
    int restarts() {
        return restarts;
    }

    /**
     * One mixing step.
     *
     * @param x   the input of this iteration, x_k (V); unchanged
     * @param out on entry G(x_k) (V); on return the next input x_{k+1}
     */
    void next(double[] x, double[] out) {
        double norm2 = 0;
        for (int i = 0; i < n; i++) {
            f[i] = out[i] - x[i];
            norm2 += f[i] * f[i];
        }
        double norm = Math.sqrt(norm2);
        if (hasLast) {
            if (norm > RESTART_GROWTH * lastNorm) {
                stored = 0;
                restarts++;
            } else {
                double[] cf = dF[head];
                double[] cx = dX[head];
                for (int i = 0; i < n; i++) {
                    cf[i] = f[i] - lastF[i];
                    cx[i] = x[i] - lastX[i];
                }
                head = (head + 1) % depth;
                stored = Math.min(stored + 1, depth);
            }
        }
        System.arraycopy(x, 0, lastX, 0, n);
        System.arraycopy(f, 0, lastF, 0, n);
        lastNorm = norm;
        hasLast = true;
        int m = solveLeastSquares();
        for (int i = 0; i < n; i++) {
            out[i] = x[i] + beta * f[i];
        }
        for (int j = 0; j < m; j++) {
            double g = gamma[j];
            if (g == 0) {
                continue;
            }
            double[] cf = column(dF, j);
            double[] cx = column(dX, j);
            for (int i = 0; i < n; i++) {
                out[i] -= g * (cx[i] + beta * cf[i]);
            }
        }
    }

    /** Column j of a history, newest first. */
    private double[] column(double[][] h, int j) {
        return h[((head - 1 - j) % depth + depth) % depth];
    }

    /**
     * gamma = argmin |f - dF gamma| over the newest columns; drops the oldest while the normal
     * equations are singular.
     *
     * @return the number of columns used (gamma beyond it is zero)
     */
    private int solveLeastSquares() {
        int m = stored;
        while (m > 0) {
            for (int a = 0; a < m; a++) {
                double[] ca = column(dF, a);
                for (int b = 0; b <= a; b++) {
                    double[] cb = column(dF, b);
                    double s = 0;
                    for (int i = 0; i < n; i++) {
                        s += ca[i] * cb[i];
                    }
                    normal[a][b] = s;
                    normal[b][a] = s;
                }
                double s = 0;
                for (int i = 0; i < n; i++) {
                    s += ca[i] * f[i];
                }
                normal[a][m] = s;
            }
            if (eliminate(m)) {
                return m;
            }
            m--;
        }
        return 0;
    }

    /** Gaussian elimination with partial pivoting on the augmented m x (m+1) system; false if singular. */
    private boolean eliminate(int m) {
        double scale = 0;
        for (int a = 0; a < m; a++) {
            scale = Math.max(scale, Math.abs(normal[a][a]));
        }
        if (!(scale > 0) || !Double.isFinite(scale)) {
            return false;
        }
        for (int c = 0; c < m; c++) {
            int p = c;
            for (int r = c + 1; r < m; r++) {
                if (Math.abs(normal[r][c]) > Math.abs(normal[p][c])) {
                    p = r;
                }
            }
            if (Math.abs(normal[p][c]) < RELATIVE_PIVOT * scale) {
                return false;
            }
            double[] t = normal[p];
            normal[p] = normal[c];
            normal[c] = t;
            for (int r = c + 1; r < m; r++) {
                double factor = normal[r][c] / normal[c][c];
                for (int k = c; k <= m; k++) {
                    normal[r][k] -= factor * normal[c][k];
                }
            }
        }
        for (int c = m - 1; c >= 0; c--) {
            double s = normal[c][m];
            for (int k = c + 1; k < m; k++) {
                s -= normal[c][k] * rhs[k];
            }
            rhs[c] = s / normal[c][c];
        }
        for (int j = 0; j < depth; j++) {
            gamma[j] = j < m ? rhs[j] : 0;
        }
        return true;
    }
}
