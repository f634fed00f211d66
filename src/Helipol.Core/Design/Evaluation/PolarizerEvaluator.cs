using Helipol.Engine;
using Helipol.Model;

namespace Helipol.Design;

/// <summary>
/// Solves one polarizer geometry at a list of frequencies and samples its far field: the
/// geometry is meshed once (for its design's mesh frequency, see <see cref="MeshDensity"/>, or the
/// highest frequency asked when that is higher) and the engine's sweep reuses it.
/// </summary>
public static class PolarizerEvaluator
{
    /// <summary>
    /// Per-frequency samples. <paramref name="maxParallelism"/> 1 keeps the sweep on the calling
    /// thread (when the caller already spreads work over the cores).
    /// </summary>
    public static IReadOnlyList<CircularSamples> Sample(PolarizerBuild build, IReadOnlyList<double> frequenciesHz, ObservationSet directions,
        FieldSolveCounter? counter = null, int? maxParallelism = null)
    {
        double meshF = MeshDensity.ForRun(build.MeshFrequencyHz, frequenciesHz);
        var mesh = MeshedModel.Create(PolarizerWires.Build(build, meshF), meshF);
        return SampleMesh(mesh, frequenciesHz, directions, counter, maxParallelism);
    }

    /// <summary>The bare whip (no polarizer) at the same frequencies and directions, meshed like the polarizer's build.</summary>
    public static IReadOnlyList<CircularSamples> SampleBareWhip(WhipKind kind, double lengthM, double radiusM, IReadOnlyList<double> frequenciesHz,
        ObservationSet directions, FieldSolveCounter? counter = null, int? maxParallelism = null, double? meshFrequencyHz = null)
    {
        double meshF = MeshDensity.ForRun(meshFrequencyHz, frequenciesHz);
        var mesh = MeshedModel.Create(PolarizerWires.BareWhip(kind, lengthM, radiusM), meshF);
        return SampleMesh(mesh, frequenciesHz, directions, counter, maxParallelism);
    }

    private static IReadOnlyList<CircularSamples> SampleMesh(MeshedModel mesh, IReadOnlyList<double> frequenciesHz, ObservationSet directions,
        FieldSolveCounter? counter, int? maxParallelism)
    {
        var solutions = MomSolver.Sweep(mesh, frequenciesHz, maxParallelism);
        counter?.Add(frequenciesHz.Count);
        var result = new CircularSamples[solutions.Count];
        if (maxParallelism == 1 || solutions.Count == 1)
            for (int i = 0; i < solutions.Count; i++) result[i] = CircularSamples.From(solutions[i], directions);
        else
            Parallel.For(0, solutions.Count, Parallelism.Options(maxParallelism),
                i => result[i] = CircularSamples.From(solutions[i], directions));
        return result;
    }

    /// <summary>Summaries of every frequency for the wanted sense, realized gains against <paramref name="receiverOhm"/>.</summary>
    public static IReadOnlyList<FrequencySummary> Evaluate(PolarizerBuild build, IReadOnlyList<double> frequenciesHz, ObservationSet directions, Sense sense,
        FieldSolveCounter? counter = null, int? maxParallelism = null, double receiverOhm = 50) =>
        Sample(build, frequenciesHz, directions, counter, maxParallelism).Select(s => s.Summarize(sense, receiverOhm)).ToArray();
}
