using System.Numerics;
using System.Runtime.InteropServices;

namespace Helipol.Engine.Solve;

/// <summary>
/// Hand-written dense complex LU with partial pivoting (Golub and Van Loan, *Matrix Computations*,
/// algorithm 3.4.1, right-looking, row-major), real and imaginary parts in separate planes so the row
/// update runs on SIMD vectors. Same arithmetic as the library path in a cache- and SIMD-friendly
/// layout; the tests check it against <see cref="MathNetLuSolver"/>. Keeps its work arrays per thread,
/// so repeated solves of the same size allocate nothing.
/// </summary>
internal sealed class DenseLuSolver : ILinearSolver
{
    public static DenseLuSolver Instance { get; } = new();

    [ThreadStatic] private static double[]? _re, _im;

    public void Solve(Complex[] matrix, int n, Complex[] rhs, Complex[] solution)
    {
        if (_re is null || _re.Length < n * n) { _re = new double[n * n]; _im = new double[n * n]; }
        double[] re = _re, im = _im!;
        // Column-major complex in, row-major planes out.
        for (int j = 0; j < n; j++)
            for (int i = 0; i < n; i++)
            {
                Complex v = matrix[i + j * n];
                re[i * n + j] = v.Real;
                im[i * n + j] = v.Imaginary;
            }
        for (int i = 0; i < n; i++) solution[i] = rhs[i];

        int width = Vector<double>.Count;
        for (int k = 0; k < n; k++)
        {
            int pivot = k;
            double best = -1;
            for (int i = k; i < n; i++)
            {
                double m = re[i * n + k] * re[i * n + k] + im[i * n + k] * im[i * n + k];
                if (m > best) { best = m; pivot = i; }
            }
            if (!(best > 0)) throw new ModelException("solve: found a singular impedance matrix, allowed a model whose wires and loads give a unique current");
            if (pivot != k)
            {
                SwapRows(re, n, k, pivot);
                SwapRows(im, n, k, pivot);
                (solution[k], solution[pivot]) = (solution[pivot], solution[k]);
            }
            double pr = re[k * n + k], pi = im[k * n + k];
            double invAbs = 1 / (pr * pr + pi * pi);
            double ir = pr * invAbs, ii = -pi * invAbs; // 1 / pivot
            var rowKr = re.AsSpan(k * n + k + 1, n - k - 1);
            var rowKi = im.AsSpan(k * n + k + 1, n - k - 1);
            var bk = solution[k];
            for (int i = k + 1; i < n; i++)
            {
                double ar = re[i * n + k], ai = im[i * n + k];
                double lr = ar * ir - ai * ii, li = ar * ii + ai * ir;
                if (lr == 0 && li == 0) continue;
                solution[i] -= new Complex(lr, li) * bk;
                var rowIr = re.AsSpan(i * n + k + 1, n - k - 1);
                var rowIi = im.AsSpan(i * n + k + 1, n - k - 1);
                var vlr = new Vector<double>(lr);
                var vli = new Vector<double>(li);
                var kr = MemoryMarshal.Cast<double, Vector<double>>(rowKr);
                var ki = MemoryMarshal.Cast<double, Vector<double>>(rowKi);
                var xr = MemoryMarshal.Cast<double, Vector<double>>(rowIr);
                var xi = MemoryMarshal.Cast<double, Vector<double>>(rowIi);
                for (int v = 0; v < kr.Length; v++)
                {
                    xr[v] -= vlr * kr[v] - vli * ki[v];
                    xi[v] -= vlr * ki[v] + vli * kr[v];
                }
                for (int j = kr.Length * width; j < rowKr.Length; j++)
                {
                    double br = rowKr[j], bi = rowKi[j];
                    rowIr[j] -= lr * br - li * bi;
                    rowIi[j] -= lr * bi + li * br;
                }
            }
        }
        // Back substitution with the upper triangle.
        for (int i = n - 1; i >= 0; i--)
        {
            Complex sum = solution[i];
            for (int j = i + 1; j < n; j++) sum -= new Complex(re[i * n + j], im[i * n + j]) * solution[j];
            solution[i] = sum / new Complex(re[i * n + i], im[i * n + i]);
        }
    }

    private static void SwapRows(double[] a, int n, int r1, int r2)
    {
        var x = a.AsSpan(r1 * n, n);
        var y = a.AsSpan(r2 * n, n);
        for (int j = 0; j < n; j++) (x[j], y[j]) = (y[j], x[j]);
    }
}
