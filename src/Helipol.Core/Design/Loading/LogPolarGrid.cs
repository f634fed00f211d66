namespace Helipol.Design.Loading;

/// <summary>
/// A cell-centred grid in (u, θ) with u = ln r, around a wire of radius a centred at the origin,
/// from r = a to r = <see cref="OuterRadiusM"/>; θ is periodic.
///
/// <para>Why log-polar: the map w = ln z is conformal, so the two-dimensional equation
/// ∇·(ε∇φ) = 0 keeps its form in (u, θ): ∂u(ε ∂uφ) + ∂θ(ε ∂θφ) = 0 (the factor r² cancels).
/// A uniform grid in (u, θ) is therefore a radially graded grid in the plane whose cells stay
/// square, finest at the wire where the field is strongest and the layers are thinnest.</para>
/// </summary>
public sealed class LogPolarGrid
{
    public LogPolarGrid(double wireRadiusM, int angularCells, double outerToWireRatio = DefaultOuterRatio)
    {
        if (angularCells < 8) throw new ArgumentOutOfRangeException(nameof(angularCells), "at least 8 cells around the wire");
        WireRadiusM = wireRadiusM;
        AngularCells = angularCells;
        double span = Math.Log(outerToWireRatio);
        // Radial cells as square as the angular ones: Δu ≈ Δθ.
        RadialCells = Math.Max(4, (int)Math.Ceiling(span / (2 * Math.PI / angularCells)));
        DeltaU = span / RadialCells;
        DeltaTheta = 2 * Math.PI / angularCells;
        OuterRadiusM = wireRadiusM * outerToWireRatio;
    }

    /// <summary>The outer boundary (grounded) at 100 wire radii: far enough that the material
    /// beyond it changes the wire's charge little, near enough to keep the grid small.</summary>
    public const double DefaultOuterRatio = 100;

    public double WireRadiusM { get; }
    public double OuterRadiusM { get; }
    public int RadialCells { get; }
    public int AngularCells { get; }
    public double DeltaU { get; }
    public double DeltaTheta { get; }
    public int CellCount => RadialCells * AngularCells;

    /// <summary>Cell index, θ fastest.</summary>
    public int Index(int i, int j) => i * AngularCells + j;

    /// <summary>Point at fractional cell coordinates (i + fi, j + fj), fi, fj in [0, 1], in metres.</summary>
    public (double X, double Y) Point(int i, int j, double fi, double fj)
    {
        double r = WireRadiusM * Math.Exp((i + fi) * DeltaU);
        double t = (j + fj) * DeltaTheta;
        return (r * Math.Cos(t), r * Math.Sin(t));
    }
}
