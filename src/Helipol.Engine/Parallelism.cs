namespace Helipol.Engine;

/// <summary>
/// The one cap on worker threads used by every parallel loop of the engine and of the solver above
/// it. Results never depend on it: each parallel loop writes its own slot of an array and every
/// reduction runs afterwards in index order, so one thread and many give the same bits.
/// The command line sets it from the HELIPOL_THREADS environment variable.
/// </summary>
public static class Parallelism
{
    private static int _maxDegree = Environment.ProcessorCount;

    /// <summary>Most worker threads a parallel loop may use (≥ 1; default: the processor count).</summary>
    public static int MaxDegree
    {
        get => _maxDegree;
        set => _maxDegree = Math.Max(1, value);
    }

    /// <summary>Options for a parallel loop: the requested degree, never above <see cref="MaxDegree"/>.</summary>
    public static ParallelOptions Options(int? requested = null) =>
        new() { MaxDegreeOfParallelism = Math.Max(1, Math.Min(requested ?? MaxDegree, MaxDegree)) };
}
