namespace Helipol.Spec;

/// <summary>
/// One problem in a design file. <see cref="ToString"/> gives the stable one-line form
/// <c>file:line:column: field.path: found ..., allowed ...</c> that users and tests rely on.
/// </summary>
public sealed record SpecError(string File, SourceMark? Mark, string FieldPath, string Found, string Allowed)
{
    /// <summary>Field path used for problems that concern the whole file rather than one key.</summary>
    public const string WholeFile = "(file)";

    /// <remarks>A problem with no place in the text (a missing file) is printed without line and column.</remarks>
    public override string ToString() => Mark is { } m
        ? $"{File}:{m.Line}:{m.Column}: {FieldPath}: found {Found}, allowed {Allowed}"
        : $"{File}: {FieldPath}: found {Found}, allowed {Allowed}";
}

/// <summary>Thrown when a design file cannot be accepted; carries every problem found, in file order.</summary>
public sealed class DesignInputException : Exception
{
    public DesignInputException(IReadOnlyList<SpecError> errors)
        : base(errors.Count > 0 ? errors[0].ToString() : "invalid design")
    {
        Errors = errors;
    }

    public DesignInputException(SpecError error) : this(new[] { error }) { }

    public IReadOnlyList<SpecError> Errors { get; }
}
