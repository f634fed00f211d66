namespace Helipol.Engine;

/// <summary>A wire model the engine refuses to solve; the message says what is wrong and where.</summary>
public sealed class ModelException(string message) : Exception(message);
