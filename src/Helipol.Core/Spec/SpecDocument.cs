namespace Helipol.Spec;

/// <summary>
/// A design file that passed the per-key checks: every value (given or defaulted) by its key path,
/// with its place in the file. The Model turns this into SI design data and checks the geometry.
/// </summary>
public sealed class SpecDocument
{
    public SpecDocument(string file, string designFolder, IReadOnlyDictionary<string, SpecValue> values)
    {
        File = file;
        DesignFolder = designFolder;
        Values = values;
    }

    /// <summary>The file as the user named it (used in messages).</summary>
    public string File { get; }

    public string DesignFolder { get; }

    public IReadOnlyDictionary<string, SpecValue> Values { get; }

    public SpecValue? Find(string path) => Values.TryGetValue(path, out var value) ? value : null;

    public T Get<T>(string path) where T : SpecValue =>
        Find(path) as T ?? throw new InvalidOperationException($"{path} is not a {typeof(T).Name} (table and reader disagree)");

    public bool IsAuto(string path) => Find(path) is AutoValue;

    public bool IsNone(string path) => Find(path) is NoneValue;

    /// <summary>The SI value of a quantity key, or null if absent or auto.</summary>
    public double? Si(string path) => Find(path) is QuantityValue q ? q.Si : null;

    public string Choice(string path) => Get<ChoiceValue>(path).Value;

    public int Integer(string path) => Get<IntegerValue>(path).Value;

    public double? Number(string path) => Find(path) is NumberValue n ? n.Value : null;

    /// <summary>Where a key was written, or where its block was (for defaults).</summary>
    public SourceMark MarkOf(string path) => Find(path)?.Mark ?? SourceMark.FileStart;

    public string WrittenOf(string path) => Find(path)?.Written ?? "(not given)";
}
