namespace Helipol.Spec;

/// <summary>A checked value read from a design file (or a documented default), with where it came from.</summary>
public abstract record SpecValue
{
    public SourceMark Mark { get; init; }

    /// <summary>True when the file did not give the key and the documented default was used.</summary>
    public bool IsDefault { get; init; }

    /// <summary>The value as the user wrote it (or as the default is written), for messages.</summary>
    public abstract string Written { get; }
}

/// <summary>A quantity converted to SI (metres, hertz, radians, siemens per metre, or a plain fraction for %).</summary>
public sealed record QuantityValue(double Si, QuantityKind Kind, string Text) : SpecValue
{
    public override string Written => Text;
}

public sealed record AutoValue : SpecValue
{
    public override string Written => "auto";
}

public sealed record IntegerValue(int Value) : SpecValue
{
    public override string Written => Value.ToString(System.Globalization.CultureInfo.InvariantCulture);
}

/// <summary>A dimensionless number such as a relative permittivity.</summary>
public sealed record NumberValue(double Value, string Text) : SpecValue
{
    public override string Written => Text;
}

public sealed record ChoiceValue(string Value) : SpecValue
{
    public override string Written => Value;
}

public sealed record TextValue(string Value) : SpecValue
{
    public override string Written => Value;
}

/// <summary>A block the user switched off with <c>none</c> (for example <c>wrap: none</c>).</summary>
public sealed record NoneValue : SpecValue
{
    public override string Written => "none";
}

/// <summary>Marks that a block is present; its keys are stored under their own paths.</summary>
public sealed record BlockValue : SpecValue
{
    public override string Written => "a mapping";
}

/// <summary>An ordered pair written as a two-item list, e.g. <c>[3, 8]</c>.</summary>
public sealed record PairValue(SpecValue Low, SpecValue High) : SpecValue
{
    public override string Written => $"[{Low.Written}, {High.Written}]";
}
