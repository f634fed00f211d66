using System.Numerics;
using Helipol.Engine.Kernel;
using Helipol.Engine.Solve;

namespace Helipol.Engine;

/// <summary>Solves a <see cref="MeshedModel"/> at one frequency or over a sweep.</summary>
public static class MomSolver
{
    [ThreadStatic] private static Complex[]? _matrix;

    /// <summary>
    /// Fills and solves the impedance matrix at <paramref name="frequencyHz"/> (0 &lt; f ≤ the mesh's
    /// maximum frequency). Throws <see cref="ModelException"/> for a frequency out of range or a
    /// singular system.
    /// </summary>
    public static MomSolution Solve(MeshedModel mesh, double frequencyHz) =>
        Solve(mesh, frequencyHz, DenseLuSolver.Instance, useReferenceFill: false);

    /// <summary>
    /// Solves every frequency, in parallel over frequencies (each its own matrix), reusing the mesh's
    /// quadrature. Results are in the order of <paramref name="frequenciesHz"/>.
    /// <paramref name="maxParallelism"/> defaults to <see cref="Parallelism.MaxDegree"/> and never exceeds it.
    /// </summary>
    public static IReadOnlyList<MomSolution> Sweep(MeshedModel mesh, IReadOnlyList<double> frequenciesHz, int? maxParallelism = null)
    {
        ArgumentNullException.ThrowIfNull(frequenciesHz);
        foreach (var f in frequenciesHz) CheckFrequency(mesh, f);
        var results = new MomSolution[frequenciesHz.Count];
        var options = Parallelism.Options(maxParallelism);
        Parallel.For(0, frequenciesHz.Count, options, i => results[i] = Solve(mesh, frequenciesHz[i]));
        return results;
    }

    internal static MomSolution Solve(MeshedModel mesh, double frequencyHz, ILinearSolver solver, bool useReferenceFill)
    {
        ArgumentNullException.ThrowIfNull(mesh);
        CheckFrequency(mesh, frequencyHz);
        int n = mesh.UnknownCount;
        // One matrix buffer per thread, reused across the frequencies of a sweep (the LU overwrites it).
        if (_matrix is null || _matrix.Length < n * n) _matrix = new Complex[n * n];
        var z = _matrix;
        FillMatrix(mesh, frequencyHz, z, useReferenceFill);
        var rhs = new Complex[n];
        for (int i = 0; i < mesh.SourceBases.Length; i++)
            for (int k = 0; k < mesh.SourceGapBases[i].Length; k++)
                rhs[mesh.SourceGapBases[i][k]] += mesh.SourceGapWeights[i][k] * mesh.SourceVolts[i];
        var currents = new Complex[n];
        solver.Solve(z, n, rhs, currents);
        foreach (var c in currents)
            if (!double.IsFinite(c.Real) || !double.IsFinite(c.Imaginary))
                throw new ModelException(FormattableString.Invariant($"solve at {frequencyHz} Hz: found a singular impedance matrix, allowed a model whose wires and loads give a unique current"));
        return new MomSolution(mesh, frequencyHz, currents);
    }

    /// <summary>Fills the column-major impedance matrix at one frequency (adaptive or plain reference table).</summary>
    internal static void FillMatrix(MeshedModel mesh, double frequencyHz, Complex[] z, bool useReferenceFill)
    {
        double k = 2 * Math.PI * frequencyHz / PhysicalConstants.SpeedOfLight;
        if (useReferenceFill) ImpedanceMatrix.Fill(mesh, mesh.ReferenceTable, mirrored: false, k, z);
        else ImpedanceMatrix.Fill(mesh, mesh.Table, mirrored: true, k, z);
    }

    private static void CheckFrequency(MeshedModel mesh, double frequencyHz)
    {
        if (!(double.IsFinite(frequencyHz) && frequencyHz > 0 && frequencyHz <= mesh.MaxFrequencyHz * (1 + 1e-9)))
            throw new ModelException(FormattableString.Invariant(
                $"frequency: found {frequencyHz} Hz, allowed 0 < f ≤ {mesh.MaxFrequencyHz} Hz (the frequency the model was segmented for)"));
    }
}
