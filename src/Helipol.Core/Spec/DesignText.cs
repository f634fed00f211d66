using System.Text;

namespace Helipol.Spec;

/// <summary>
/// Reads a design file's bytes into text, refusing what a hand-written design never is:
/// oversized files, UTF-16/UTF-32, invalid UTF-8, NUL bytes and tab characters (YAML 1.2 §6.1
/// forbids tabs in indentation; we refuse them everywhere so the error is simple and early).
/// </summary>
public static class DesignText
{
    /// <summary>A real design is a few kilobytes; 1 MiB leaves room for comments and stops runaway inputs.</summary>
    public const int MaxBytes = 1 << 20;

    private static readonly UTF8Encoding StrictUtf8 = new(encoderShouldEmitUTF8Identifier: false, throwOnInvalidBytes: true);

    public static string Load(string path, string shownAs)
    {
        FileInfo info;
        try
        {
            info = new FileInfo(path);
            if (Directory.Exists(path))
                throw Whole(shownAs, null, "a folder", "a design file (.yaml)");
            if (!info.Exists)
                throw Whole(shownAs, null, "no such file", "an existing design file");
        }
        catch (ArgumentException)
        {
            throw Whole(shownAs, null, "an unusable file name", "an existing design file");
        }
        if (info.Length > MaxBytes)
            throw Whole(shownAs, SourceMark.FileStart, $"{info.Length} bytes", $"at most {MaxBytes} bytes (1 MiB) in a design file");
        return Decode(File.ReadAllBytes(path), shownAs);
    }

    public static string Decode(byte[] bytes, string shownAs)
    {
        if (bytes.Length > MaxBytes)
            throw Whole(shownAs, SourceMark.FileStart, $"{bytes.Length} bytes", $"at most {MaxBytes} bytes (1 MiB) in a design file");
        if (StartsWith(bytes, 0xFF, 0xFE) || StartsWith(bytes, 0xFE, 0xFF) || StartsWith(bytes, 0x00, 0x00, 0xFE, 0xFF))
            throw Whole(shownAs, SourceMark.FileStart, "UTF-16 or UTF-32 text (byte-order mark)", "UTF-8 text");
        var start = StartsWith(bytes, 0xEF, 0xBB, 0xBF) ? 3 : 0; // a UTF-8 byte-order mark is harmless: skip it
        string text;
        try
        {
            text = StrictUtf8.GetString(bytes, start, bytes.Length - start);
        }
        catch (DecoderFallbackException)
        {
            throw Whole(shownAs, PlaceOfFirstInvalidByte(bytes, start), "bytes that are not valid UTF-8", "UTF-8 text");
        }
        var line = 1;
        var column = 1;
        foreach (var ch in text)
        {
            if (ch == '\0')
                throw Whole(shownAs, new SourceMark(line, column), "a NUL character (binary or UTF-16 data?)", "UTF-8 text");
            if (ch == '\t')
                throw new DesignInputException(new SpecError(shownAs, new SourceMark(line, column), "(text)", "a tab character", "spaces for indentation and separation"));
            if (ch == '\n') { line++; column = 1; }
            else column++;
        }
        return text;
    }

    private static SourceMark PlaceOfFirstInvalidByte(byte[] bytes, int start)
    {
        var line = 1;
        var column = 1;
        var rest = bytes.AsSpan(start);
        while (!rest.IsEmpty)
        {
            if (Rune.DecodeFromUtf8(rest, out var rune, out var consumed) != System.Buffers.OperationStatus.Done)
                return new SourceMark(line, column);
            if (rune.Value == '\n') { line++; column = 1; }
            else column += rune.Utf16SequenceLength;
            rest = rest[consumed..];
        }
        return new SourceMark(line, column);
    }

    private static bool StartsWith(byte[] bytes, params byte[] prefix) =>
        bytes.Length >= prefix.Length && bytes.AsSpan(0, prefix.Length).SequenceEqual(prefix);

    private static DesignInputException Whole(string file, SourceMark? mark, string found, string allowed) =>
        new(new SpecError(file, mark, SpecError.WholeFile, found, allowed));
}
