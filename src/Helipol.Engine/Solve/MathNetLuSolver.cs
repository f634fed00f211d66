using Complex = System.Numerics.Complex;
using MathNet.Numerics.LinearAlgebra;

namespace Helipol.Engine.Solve;

/// <summary>Reference solve: MathNet.Numerics dense complex LU with partial pivoting.</summary>
internal sealed class MathNetLuSolver : ILinearSolver
{
    public static MathNetLuSolver Instance { get; } = new();

    public void Solve(Complex[] matrix, int n, Complex[] rhs, Complex[] solution)
    {
        var z = Matrix<Complex>.Build.Dense(n, n, matrix.Length == n * n ? matrix : matrix[..(n * n)]);
        var x = z.LU().Solve(Vector<Complex>.Build.Dense(rhs));
        for (int i = 0; i < n; i++) solution[i] = x[i];
    }
}
