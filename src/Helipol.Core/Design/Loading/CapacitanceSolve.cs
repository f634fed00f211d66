namespace Helipol.Design.Loading;

/// <summary>
/// Capacitance per unit length of a round wire in a two-dimensional, piecewise-constant
/// dielectric, by a finite-volume solve on a <see cref="LogPolarGrid"/>: the wire at potential 1,
/// a grounded circle at the grid's outer radius.
///
/// <para>Method. Cell-centred finite volumes (Patankar, "Numerical Heat Transfer and Fluid Flow",
/// 1980, ch. 4): the map is sampled 16 × 2 times (along × across the flux) over each face's strip (below). The Dirichlet faces at the wire
/// and at the outer circle sit half a cell from the centres. The symmetric M-matrix is solved by
/// conjugate gradients (Hestenes and Stiefel, J. Res. NBS 49(6), 1952) preconditioned by
/// <see cref="IncompleteCholesky"/>. The charge per unit length is the Gauss flux through the
/// wire's surface, Q/ε0 = Σ ε_face (Δθ/(Δu/2)) (1 − φ_cell).</para>
///
/// Results are in units of ε0: the returned number c gives C′ = ε0·c.
/// </summary>
public static class CapacitanceSolve
{
    /// <summary>Tolerance on the preconditioned residual, relative to the right-hand side's (the charge then
    /// settles to far better than the grid's own error).</summary>
    public const double Tolerance = 1e-9;

    private const int Along = 16, Across = 2;

    /// <summary>C′/ε0 of the wire in <paramref name="map"/> on <paramref name="grid"/>.</summary>
    public static double RelativeCapacitance(LogPolarGrid grid, IPermittivityMap map)
    {
        int nu = grid.RadialCells, nt = grid.AngularCells, n = grid.CellCount;
        // Each face's permittivity is the effective one of the strip between the two cell centres
        // it joins: across sub-layers the flux crosses in series (harmonic mean along the strip),
        // along them it runs in parallel (arithmetic mean across it). For layers that the strip
        // cuts anywhere this carries the flux exactly, where a harmonic mean of two cell averages
        // would move a boundary inside a cell by up to a tenth of the cell (Patankar §4.2-4 takes
        // the same series view of a face between two materials).
        double StripRadial(int i, int j, double from, double to)
        {
            double inv = 0;
            for (int si = 0; si < Along; si++)
            {
                double fi = from + (to - from) * (si + 0.5) / Along, row = 0;
                for (int sj = 0; sj < Across; sj++)
                {
                    var (x, y) = grid.Point(i, j, fi, (sj + 0.5) / Across);
                    row += map.At(x, y);
                }
                inv += Across / row;
            }
            return Along / inv;
        }
        double StripAngular(int i, int j)
        {
            double inv = 0;
            for (int sj = 0; sj < Along; sj++)
            {
                double fj = 0.5 + (sj + 0.5) / Along, col = 0;
                for (int si = 0; si < Across; si++)
                {
                    var (x, y) = grid.Point(i, j, (si + 0.5) / Across, fj);
                    col += map.At(x, y);
                }
                inv += Across / col;
            }
            return Along / inv;
        }

        double radial = grid.DeltaTheta / grid.DeltaU, angular = grid.DeltaU / grid.DeltaTheta;
        // Couplings to the outward (i+1) and counter-clockwise (j+1, periodic) neighbours.
        var gOut = new double[n];
        var gCcw = new double[n];
        var diag = new double[n];
        var rhs = new double[n];
        var wire = new double[nt];
        for (int i = 0; i < nu; i++)
            for (int j = 0; j < nt; j++)
            {
                int k = grid.Index(i, j);
                gCcw[k] = angular * StripAngular(i, j);
                if (i + 1 < nu) gOut[k] = radial * StripRadial(i, j, 0.5, 1.5);
            }
        for (int i = 0; i < nu; i++)
            for (int j = 0; j < nt; j++)
            {
                int k = grid.Index(i, j);
                double d = gCcw[k] + gCcw[grid.Index(i, (j + nt - 1) % nt)];
                if (i + 1 < nu) d += gOut[k]; else d += 2 * radial * StripRadial(i, j, 0.5, 1);   // grounded outer circle
                if (i > 0) d += gOut[grid.Index(i - 1, j)];
                else
                {
                    wire[j] = 2 * radial * StripRadial(i, j, 0, 0.5);   // the wire face, potential 1
                    d += wire[j];
                    rhs[k] = wire[j];
                }
                diag[k] = d;
            }

        // Lower-triangle pattern for IC(0): inward neighbour, clockwise neighbour, and for the last
        // column the periodic neighbour j = 0 of the same ring.
        var lowerCols = new int[n][];
        var lowerVals = new double[n][];
        for (int i = 0; i < nu; i++)
            for (int j = 0; j < nt; j++)
            {
                int k = grid.Index(i, j);
                var cols = new List<(int, double)>(3);
                if (i > 0) cols.Add((grid.Index(i - 1, j), -gOut[grid.Index(i - 1, j)]));
                if (j == nt - 1) cols.Add((grid.Index(i, 0), -gCcw[k]));
                if (j > 0) cols.Add((k - 1, -gCcw[k - 1]));
                cols.Sort((p, q) => p.Item1.CompareTo(q.Item1));
                lowerCols[k] = cols.Select(c => c.Item1).ToArray();
                lowerVals[k] = cols.Select(c => c.Item2).ToArray();
            }

        void Multiply(double[] x, double[] y)
        {
            for (int i = 0; i < nu; i++)
            {
                int row = i * nt;
                for (int j = 0; j < nt; j++)
                {
                    int k = row + j;
                    int ccw = row + (j + 1 == nt ? 0 : j + 1), cw = row + (j == 0 ? nt - 1 : j - 1);
                    double s = diag[k] * x[k] - gCcw[k] * x[ccw] - gCcw[cw] * x[cw];
                    if (i + 1 < nu) s -= gOut[k] * x[k + nt];
                    if (i > 0) s -= gOut[k - nt] * x[k - nt];
                    y[k] = s;
                }
            }
        }

        // Start from the vacuum potential, linear in u (exact without dielectric): the dielectric only
        // perturbs it, so CG starts close.
        var start = new double[n];
        for (int i = 0; i < nu; i++)
            for (int j = 0; j < nt; j++) start[grid.Index(i, j)] = 1 - (i + 0.5) / nu;
        var phi = ConjugateGradient(n, Multiply, new IncompleteCholesky(diag, lowerCols, lowerVals), rhs, start);
        double q = 0;
        for (int j = 0; j < nt; j++) q += wire[j] * (1 - phi[grid.Index(0, j)]);
        return q;
    }

    private static double[] ConjugateGradient(int n, Action<double[], double[]> multiply, IncompleteCholesky m, double[] b, double[] x)
    {
        var z = new double[n];
        var p = new double[n];
        var ap = new double[n];
        // The stopping test is relative to the right-hand side, not to the (already small) start residual.
        m.Apply(b, z);
        double stop = Tolerance * Tolerance * Dot(b, z);
        multiply(x, ap);
        var r = new double[n];
        for (int k = 0; k < n; k++) r[k] = b[k] - ap[k];
        m.Apply(r, z);
        Array.Copy(z, p, n);
        double rz = Dot(r, z);
        int it = 0;
        for (; it < 4 * n && rz > stop; it++)
        {
            multiply(p, ap);
            double alpha = rz / Dot(p, ap);
            for (int k = 0; k < n; k++) { x[k] += alpha * p[k]; r[k] -= alpha * ap[k]; }
            m.Apply(r, z);
            double next = Dot(r, z);
            double beta = next / rz;
            rz = next;
            for (int k = 0; k < n; k++) p[k] = z[k] + beta * p[k];
        }
        return x;
    }

    private static double Dot(double[] a, double[] b)
    {
        double s = 0;
        for (int k = 0; k < a.Length; k++) s += a[k] * b[k];
        return s;
    }
}
