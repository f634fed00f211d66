using System.Diagnostics;
using System.Runtime.InteropServices;
using Helipol.Emit;

namespace Helipol.Tests.Cli;

/// <summary>
/// Faults while writing a build: a full disk (a stream that fails like ENOSPC, and a real 64 KiB
/// tmpfs when this machine lets us mount one), a process killed mid-write, an unexpected failure.
/// Each time the files of the earlier build stay byte for byte as they were, no partial file
/// stands under a final name, and the program says what failed in one line with exit code 1.
/// </summary>
public class WriteFaultTests
{
    private static string QuickBuild => Path.Combine(TestPaths.Data, "robust", "quick-build.yaml");

    /// <summary>The quick design with other values under the same name, so a rewrite would change bytes.</summary>
    private static string ChangedCopy(string folder)
    {
        var path = Path.Combine(folder, "changed.yaml");
        File.WriteAllText(path, File.ReadAllText(QuickBuild).Replace("elements: 4", "elements: 5").Replace("rings: 2", "rings: 3"));
        return path;
    }

    private static Dictionary<string, byte[]> Snapshot(string folder) =>
        Directory.GetFiles(folder, "*", SearchOption.AllDirectories).ToDictionary(f => f, File.ReadAllBytes);

    private static void AssertUnchanged(Dictionary<string, byte[]> before, string folder)
    {
        var visible = Directory.GetFiles(folder, "*", SearchOption.AllDirectories).Where(f => !Path.GetFileName(f).StartsWith('.')).ToHashSet();
        Assert.Equal(before.Keys.OrderBy(k => k, StringComparer.Ordinal), visible.OrderBy(k => k, StringComparer.Ordinal));
        foreach (var (path, bytes) in before) Assert.True(bytes.AsSpan().SequenceEqual(File.ReadAllBytes(path)), $"{path} changed");
    }

    /// <summary>A stream that takes <paramref name="room"/> bytes in all, then fails as a full disk does.</summary>
    private sealed class FullDisk(Stream inner, Func<int, bool> take) : Stream
    {
        public override void Write(byte[] buffer, int offset, int count) => Write(buffer.AsSpan(offset, count));
        public override void Write(ReadOnlySpan<byte> buffer)
        {
            if (!take(buffer.Length)) throw new IOException("No space left on device");
            inner.Write(buffer);
        }
        public override void Flush() => inner.Flush();
        public override bool CanRead => false;
        public override bool CanSeek => false;
        public override bool CanWrite => true;
        public override long Length => inner.Length;
        public override long Position { get => inner.Position; set => throw new NotSupportedException(); }
        public override int Read(byte[] buffer, int offset, int count) => throw new NotSupportedException();
        public override long Seek(long offset, SeekOrigin origin) => throw new NotSupportedException();
        public override void SetLength(long value) => throw new NotSupportedException();
    }

    [Fact]
    public void FullDiskPartWayThroughTheSetLeavesTheEarlierBuildWhole()
    {
        var folder = TestPaths.NewTempFolder();
        try
        {
            var output = Path.Combine(folder, "out");
            Assert.Equal(0, CliRun.Of("build", QuickBuild, "-o", output).ExitCode);
            var before = Snapshot(output);
            long room = 200_000; // design.json, report.md and a plot fit; the rest does not
            CliRun run;
            using (AtomicFile.InterceptWrites(s => new FullDisk(s, n => (room -= n) >= 0)))
                run = CliRun.Of("build", ChangedCopy(folder), "-o", output);
            Assert.Equal(1, run.ExitCode);
            Assert.Single(run.Error.TrimEnd('\n').Split('\n'));
            Assert.Matches(@"^helipol: cannot write .*/out/quick-build/[a-z0-9-]+\.[a-z0-9]+: No space left on device$", run.FirstErrorLine);
            AssertUnchanged(before, output);
            Assert.Empty(Directory.GetFiles(output, ".*", SearchOption.AllDirectories)); // temporary files removed
        }
        finally { Directory.Delete(folder, recursive: true); }
    }

    [Fact]
    public void UnexpectedFailureIsOneLineWithExitOne()
    {
        var folder = TestPaths.NewTempFolder();
        try
        {
            CliRun run;
            using (AtomicFile.InterceptWrites(_ => throw new InvalidOperationException("the writer broke")))
                run = CliRun.Of("build", QuickBuild, "-o", Path.Combine(folder, "out"));
            Assert.Equal(1, run.ExitCode);
            Assert.Equal("helipol: internal error: the writer broke (HELIPOL_DEBUG=1 shows where)\n", run.Error);
        }
        finally { Directory.Delete(folder, recursive: true); }
    }

    [SkippableFact]
    public void RealFullTmpfsIsAOneLineFailureAndKeepsTheEarlierFile()
    {
        Skip.IfNot(RuntimeInformation.IsOSPlatform(OSPlatform.Linux) && Environment.UserName == "root", "mounting a tmpfs needs root on Linux");
        var folder = TestPaths.NewTempFolder();
        var mount = Path.Combine(folder, "tiny");
        Directory.CreateDirectory(mount);
        var (code, _, err) = Run("mount", "-t", "tmpfs", "-o", "size=64k", "tmpfs", mount);
        try
        {
            Skip.If(code != 0, "mount -t tmpfs not permitted here: " + err.Trim());
            var earlier = Path.Combine(mount, "quick-build", "design.json");
            Directory.CreateDirectory(Path.GetDirectoryName(earlier)!);
            File.WriteAllText(earlier, "{ \"earlier\": true }\n");
            var run = CliRun.Of("build", QuickBuild, "-o", mount);
            Assert.Equal(1, run.ExitCode);
            Assert.Single(run.Error.TrimEnd('\n').Split('\n'));
            Assert.Matches(@"^helipol: cannot write .*: No space left on device$", run.FirstErrorLine);
            Assert.Equal("{ \"earlier\": true }\n", File.ReadAllText(earlier));
            Assert.Equal(new[] { earlier }, Directory.GetFiles(mount, "*", SearchOption.AllDirectories));
        }
        finally
        {
            if (code == 0) Run("umount", mount);
            Directory.Delete(folder, recursive: true);
        }
    }

    [Fact]
    public void BuildKilledMidWriteLeavesTheEarlierBuildWhole()
    {
        var folder = TestPaths.NewTempFolder();
        try
        {
            var output = Path.Combine(folder, "out");
            Assert.Equal(0, CliRun.Of("build", QuickBuild, "-o", output).ExitCode);
            var before = Snapshot(output);
            var changed = ChangedCopy(folder);

            // The startup hook holds the child after every temporary file is written, before any rename.
            var env = StartupHook.PausingChild(60000);
            using (var child = Process.Start(CliProcess.StartInfo(env, null, "build", changed, "-o", output))!)
            {
                var last = Path.Combine(output, "quick-build", $".packet.pdf.partial-{child.Id}");
                var waited = Stopwatch.StartNew();
                while (!File.Exists(last) && !child.HasExited && waited.Elapsed < TimeSpan.FromMinutes(3)) Thread.Sleep(50);
                Assert.True(File.Exists(last), "the child never reached the write: " + (child.HasExited ? child.StandardError.ReadToEnd() : "timed out"));
                child.Kill(entireProcessTree: true);
                child.WaitForExit();
            }
            AssertUnchanged(before, output);

            // The same build, left alone, does change the files: the check above could have failed.
            Assert.Equal(0, CliRun.Of("build", changed, "-o", output).ExitCode);
            Assert.NotEqual(before.Single(kv => kv.Key.EndsWith("design.json", StringComparison.Ordinal)).Value,
                File.ReadAllBytes(Path.Combine(output, "quick-build", "design.json")));
            // ... and clears the temporaries the killed run left behind.
            Assert.Empty(Directory.GetFiles(output, "*.partial-*", SearchOption.AllDirectories));
        }
        finally { Directory.Delete(folder, recursive: true); }
    }

    [Fact]
    public void DebugVariableAddsTheStackTraceOnlyWhenAsked()
    {
        var folder = TestPaths.NewTempFolder();
        try
        {
            var blocker = Path.Combine(folder, "not-a-folder");
            File.WriteAllText(blocker, "a file where the output folder should be");
            var plain = CliProcess.Run(new Dictionary<string, string>(), null, "build", QuickBuild, "-o", blocker);
            var debug = CliProcess.Run(new Dictionary<string, string> { ["HELIPOL_DEBUG"] = "1" }, null, "build", QuickBuild, "-o", blocker);
            Assert.Equal(1, plain.ExitCode);
            Assert.Single(plain.Error.TrimEnd('\n').Split('\n'));
            Assert.StartsWith("helipol: cannot write ", plain.Error);
            Assert.Equal(1, debug.ExitCode);
            Assert.StartsWith(plain.Error, debug.Error);
            Assert.Contains("   at ", debug.Error);
        }
        finally { Directory.Delete(folder, recursive: true); }
    }

    private static (int Code, string Out, string Err) Run(string program, params string[] args)
    {
        var psi = new ProcessStartInfo(program) { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        foreach (var a in args) psi.ArgumentList.Add(a);
        try
        {
            using var p = Process.Start(psi)!;
            var err = p.StandardError.ReadToEndAsync();
            var output = p.StandardOutput.ReadToEnd();
            p.WaitForExit();
            return (p.ExitCode, output, err.Result);
        }
        catch (System.ComponentModel.Win32Exception ex) { return (-1, "", ex.Message); }
    }
}
