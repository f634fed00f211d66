namespace Helipol.Spec.Fields;

/// <summary>
/// One key of the design file: its name, what it accepts, whether it must be given, its default
/// (written as a user would write it, or a sentence when it depends on other keys) and what it means.
/// </summary>
public sealed record FieldDefinition(string Name, FieldType Type, string Description)
{
    public bool Required { get; init; }

    /// <summary>A literal default applied when the key is absent (e.g. "0.2 mm"); null when none applies.</summary>
    public string? Default { get; init; }

    /// <summary>A default that depends on other keys, resolved by the Model (documentation only).</summary>
    public string? DefaultRule { get; init; }
}
