using System.Collections.Concurrent;
using Helipol.Engine;

namespace Helipol.Design.Loading;

/// <summary>
/// Series inductance per unit length that the dielectric around a wire adds to the current along
/// it, from two electrostatic solves of the cross-section (<see cref="CapacitanceSolve"/>).
///
/// <para>Why this formula: in the quasi-TEM picture of a thin wire, the line's per-length
/// inductance L′ and capacitance C′ in vacuum satisfy L′C′₀ = μ0ε0. A dielectric raises C′ to C′ε
/// and leaves the magnetic field alone; an equivalent bare wire carrying the same charge needs the
/// extra series term L′ = μ0ε0 (1/C′₀ − 1/C′ε). For a concentric sleeve it is exactly Richmond and
/// Newman's (μ0/2π)(1 − 1/εr) ln(b/a) (Radio Science 11(1), 1976), which the tests hold it to.</para>
///
/// Results are cached per rounded cross-section (<see cref="ElementCrossSection.Rounded"/>), so
/// the search and the Monte Carlo pay for each distinct cross-section once.
/// </summary>
public static class AddedInductance
{
    /// <summary>Cells around the wire in the default solve (see the convergence test).</summary>
    public const int DefaultAngularCells = 256;

    private static readonly ConcurrentDictionary<ElementCrossSection, Lazy<double>> Cache = new();
    private static readonly ConcurrentDictionary<int, double> VacuumCapacitance = new();

    /// <summary>S = L′ / (μ0/2π), dimensionless, for a cross-section (cached).</summary>
    public static double ShapeFactor(ElementCrossSection section)
    {
        var key = section.Rounded();
        if (key.IsAir) return 0;
        return Cache.GetOrAdd(key, k => new Lazy<double>(() => Solve(k, DefaultAngularCells))).Value;
    }

    /// <summary>
    /// S for a cross-section solved as given, not rounded first (cached under the section itself,
    /// which is again the input of its solve): the wrap interpolation's nodes sit at exact
    /// multiples of an already rounded section's thickness.
    /// </summary>
    public static double ShapeFactorAsGiven(ElementCrossSection section)
    {
        if (section.IsAir) return 0;
        return Cache.GetOrAdd(section, k => new Lazy<double>(() => Solve(k, DefaultAngularCells))).Value;
    }

    /// <summary>L′ in H/m (cached).</summary>
    public static double HPerM(ElementCrossSection section) => PhysicalConstants.Mu0 / (2 * Math.PI) * ShapeFactor(section);

    /// <summary>S for any permittivity map, uncached, on a grid of <paramref name="angularCells"/> cells around the wire.</summary>
    public static double Solve(double wireRadiusM, IPermittivityMap map, int angularCells)
    {
        var grid = new LogPolarGrid(wireRadiusM, angularCells);
        // The vacuum solve depends on the grid's shape only (the problem is scale-free), so one per cell count.
        double c0 = VacuumCapacitance.GetOrAdd(angularCells, n => CapacitanceSolve.RelativeCapacitance(new LogPolarGrid(1, n), Vacuum.Instance));
        double ce = CapacitanceSolve.RelativeCapacitance(grid, map);
        // L′ = μ0 (1/c0 − 1/cε) with C′ = ε0 c; divided by μ0/2π.
        return 2 * Math.PI * (1 / c0 - 1 / ce);
    }

    public static double Solve(ElementCrossSection section, int angularCells) =>
        Solve(section.WireRadiusM, new CrossSectionMap(section), angularCells);

    /// <summary>Number of cross-sections solved so far (for the bench).</summary>
    public static int CachedCount => Cache.Count;

    /// <summary>Empties the cache (the bench times a cold solve).</summary>
    public static void ClearCache() => Cache.Clear();
}
