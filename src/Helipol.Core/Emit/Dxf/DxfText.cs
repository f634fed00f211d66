namespace Helipol.Emit.Dxf;

/// <summary>Text for DXF TEXT entities: plain ASCII upper case, which every reader shows alike.</summary>
internal static class DxfText
{
    public static string Clean(string s)
    {
        var chars = s.ToUpperInvariant().Select(c => c is >= ' ' and <= '~' ? c : '_').ToArray();
        return new string(chars);
    }
}
