namespace Helipol.Model;

/// <summary>
/// The one spelling of each value of a choice: the word a design file, design.json and the
/// messages use. Reading a word not in the map is a fault of the table, not of the user: the
/// Spec reader has already refused words outside the key's choices.
/// </summary>
public sealed class WordMap<T> where T : struct, Enum
{
    private readonly (T Value, string Word)[] _pairs;

    public WordMap(params (T Value, string Word)[] pairs) => _pairs = pairs;

    /// <summary>The words in the order the table lists its choices.</summary>
    public IReadOnlyList<string> Words => _pairs.Select(p => p.Word).ToArray();

    public string Word(T value) => _pairs.First(p => EqualityComparer<T>.Default.Equals(p.Value, value)).Word;

    public T Value(string word) =>
        _pairs.FirstOrDefault(p => p.Word == word) is { Word: not null } pair
            ? pair.Value
            : throw new InvalidOperationException($"'{word}' is not a word for {typeof(T).Name} (table and word map disagree)");
}

/// <summary>The words of every choice a design file offers, one map per enum.</summary>
public static class ChoiceWords
{
    public static readonly WordMap<WhipKind> WhipKind = new((Model.WhipKind.Dipole, "dipole"), (Model.WhipKind.Monopole, "monopole"));

    public static readonly WordMap<Sense> Sense = new((Model.Sense.Rhcp, "rhcp"), (Model.Sense.Lhcp, "lhcp"));

    public static readonly WordMap<Winding> Winding = new((Model.Winding.Auto, "auto"), (Model.Winding.Left, "left"), (Model.Winding.Right, "right"));

    public static readonly WordMap<Objective> Objective = new((Model.Objective.WorstAxialRatio, "worst-ar"), (Model.Objective.MeanAxialRatio, "mean-ar"));

    public static readonly WordMap<Paper> Paper = new((Model.Paper.A4, "a4"), (Model.Paper.Letter, "letter"));

    /// <summary>The sense as text and tables print it (IEEE Std 145 abbreviation, capitals).</summary>
    public static string Label(Sense sense) => Sense.Word(sense).ToUpperInvariant();
}
