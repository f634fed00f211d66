namespace Helipol.Design.Loading;

/// <summary>
/// Zero fill-in incomplete Cholesky factor IC(0) of a symmetric positive-definite sparse matrix,
/// M = L·Lᵀ with L on the sparsity pattern of A's lower triangle (Meijerink and van der Vorst,
/// "An iterative solution method for linear systems of which the coefficient matrix is a
/// symmetric M-matrix", Math. Comp. 31(137), 1977: for an M-matrix, as the finite-volume matrix
/// here is, the factorization exists and the pivots stay positive).
/// </summary>
public sealed class IncompleteCholesky
{
    private readonly double[] _diag;
    private readonly int[][] _cols;
    private readonly double[][] _vals;

    /// <param name="diagonal">A's diagonal</param>
    /// <param name="lowerCols">for each row k, the columns m &lt; k where A is non-zero, ascending</param>
    /// <param name="lowerVals">A(k, m) for those columns</param>
    public IncompleteCholesky(double[] diagonal, int[][] lowerCols, double[][] lowerVals)
    {
        int n = diagonal.Length;
        _diag = new double[n];
        _cols = lowerCols;
        _vals = new double[n][];
        for (int k = 0; k < n; k++)
        {
            var cols = lowerCols[k];
            var l = new double[cols.Length];
            double sq = 0;
            for (int q = 0; q < cols.Length; q++)
            {
                int m = cols[q];
                double s = lowerVals[k][q];
                // Σ L(k,p) L(m,p) over p < m present in both rows' patterns (no fill-in).
                for (int p = 0; p < q; p++)
                {
                    int idx = Array.IndexOf(_cols[m], cols[p]);
                    if (idx >= 0) s -= l[p] * _vals[m][idx];
                }
                l[q] = s / _diag[m];
                sq += l[q] * l[q];
            }
            double pivot = diagonal[k] - sq;
            if (!(pivot > 0)) throw new InvalidOperationException("incomplete Cholesky: a non-positive pivot (the matrix is not an M-matrix)");
            _diag[k] = Math.Sqrt(pivot);
            _vals[k] = l;
        }
    }

    /// <summary>z = (L Lᵀ)⁻¹ r: forward then backward substitution.</summary>
    public void Apply(ReadOnlySpan<double> r, Span<double> z)
    {
        int n = _diag.Length;
        for (int k = 0; k < n; k++)
        {
            double s = r[k];
            var cols = _cols[k];
            var l = _vals[k];
            for (int q = 0; q < cols.Length; q++) s -= l[q] * z[cols[q]];
            z[k] = s / _diag[k];
        }
        for (int k = n - 1; k >= 0; k--)
        {
            z[k] /= _diag[k];
            var cols = _cols[k];
            var l = _vals[k];
            for (int q = 0; q < cols.Length; q++) z[cols[q]] -= l[q] * z[k];
        }
    }
}
