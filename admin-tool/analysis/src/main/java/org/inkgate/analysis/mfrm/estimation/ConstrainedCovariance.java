package org.inkgate.analysis.mfrm.estimation;

import java.util.List;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.DecompositionSolver;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.SingularValueDecomposition;

/**
 * Covariance of estimates identified by linear constraints, from a singular information matrix:
 * the upper-left block of the inverse of the bordered matrix [[J, C'], [C, 0]] (Silvey 1959,
 * "The Lagrangian multiplier test"; Aitchison & Silvey 1958 [memory]).
 *
 * <p>Why not the Moore-Penrose inverse of J: that is the covariance under the constraint
 * "orthogonal to J's null space", which is the reported centring only when the null space is
 * spanned by the constraint rows themselves. Under a rating scale it is (a whole facet, or all
 * thresholds, shifted against the candidates). Under partial credit by a modelled facet it is not:
 * an element's measure trades off against its own thresholds (D_i + c, F_ik - c), a direction that
 * is not a centring row, and the Moore-Penrose covariance understated that facet's SEs by about a
 * fifth (issue 18). When C does not identify the parameters (the bordered matrix is singular) the
 * Moore-Penrose inverse is returned, as before.
 */
final class ConstrainedCovariance {
    private ConstrainedCovariance() {
    }

    /**
     * @param information q x q symmetric information matrix (singular along the unidentified directions)
     * @param constraints rows of length q: the reported estimates satisfy row . theta = 0
     */
    static RealMatrix of(double[][] information, List<double[]> constraints) {
        int q = information.length;
        int r = constraints.size();
        double[][] bordered = new double[q + r][q + r];
        for (int i = 0; i < q; i++) {
            System.arraycopy(information[i], 0, bordered[i], 0, q);
        }
        for (int c = 0; c < r; c++) {
            double[] row = constraints.get(c);
            for (int i = 0; i < q; i++) {
                bordered[q + c][i] = row[i];
                bordered[i][q + c] = row[i];
            }
        }
        DecompositionSolver solver = new LUDecomposition(new Array2DRowRealMatrix(bordered, false), 1e-12).getSolver();
        if (r > 0 && solver.isNonSingular()) {
            return solver.getInverse().getSubMatrix(0, q - 1, 0, q - 1);
        }
        return new SingularValueDecomposition(new Array2DRowRealMatrix(information, false)).getSolver().getInverse();
    }
}
