using System.Numerics;

namespace Helipol.Engine.Solve;

/// <summary>The one seam behind which the dense complex linear solve lives.</summary>
internal interface ILinearSolver
{
    /// <summary>Solves Z·x = b. <paramref name="matrix"/> is column-major N×N and may be overwritten.</summary>
    void Solve(Complex[] matrix, int n, Complex[] rhs, Complex[] solution);
}
