namespace Helipol.Spec;

/// <summary>Collects the problems of one file so the user sees all of them at once, first one first.</summary>
public sealed class SpecErrors
{
    private readonly List<SpecError> _errors = new();

    public SpecErrors(string file) => File = file;

    public string File { get; }

    public int Count => _errors.Count;

    public void Add(SourceMark? mark, string fieldPath, string found, string allowed) =>
        _errors.Add(new SpecError(File, mark, fieldPath, found, allowed));

    /// <summary>Problems ordered by position in the file (stable for ties), so the first line is predictable.</summary>
    public IReadOnlyList<SpecError> InFileOrder() =>
        _errors.Select((e, i) => (e, i))
            .OrderBy(p => p.e.Mark?.Line ?? 0).ThenBy(p => p.e.Mark?.Column ?? 0).ThenBy(p => p.i)
            .Select(p => p.e).ToList();

    public void ThrowIfAny()
    {
        if (_errors.Count > 0) throw new DesignInputException(InFileOrder());
    }
}
