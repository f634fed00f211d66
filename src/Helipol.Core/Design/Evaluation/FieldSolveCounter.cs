namespace Helipol.Design;

/// <summary>Counts field solves (one matrix fill and solve at one frequency), safely across threads.</summary>
public sealed class FieldSolveCounter
{
    private long _count;

    public long Count => Interlocked.Read(ref _count);

    public void Add(int solves) => Interlocked.Add(ref _count, solves);
}
