namespace Helipol.Emit;

/// <summary>One output file: its name in the design's folder and its bytes.</summary>
public sealed record FabricationFile(string FileName, byte[] Bytes);
