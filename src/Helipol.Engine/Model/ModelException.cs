namespace Helipol.Engine;

/// <summary>A wire model the engine refuses to solve; the message says what is wrong and where.</summary>
/// <param name="wireIndices">The wires the fault lies on, when it lies on particular wires, so a
/// caller can point its user at the input that made them.</param>
public sealed class ModelException(string message, params int[] wireIndices) : Exception(message)
{
    public IReadOnlyList<int> WireIndices { get; } = wireIndices;
}
