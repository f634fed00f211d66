using System.Globalization;
using Helipol.Emit;

/// <summary>
/// Loaded into a child <c>helipol</c> process by the runtime's startup-hook mechanism
/// (DOTNET_STARTUP_HOOKS, which requires a type named StartupHook in no namespace with a static
/// Initialize): it sets <see cref="AtomicFile.BeforeRenames"/> to sleep, so a test can kill the child
/// between writing the temporary files and renaming them. The program itself reads no test variable.
/// </summary>
internal static class StartupHook
{
    /// <summary>Milliseconds the child sleeps before its renames; read by this hook only, inside the child.</summary>
    public const string PauseVariable = "HELIPOL_TEST_HOOK_PAUSE_MS";

    public static void Initialize()
    {
        if (int.TryParse(Environment.GetEnvironmentVariable(PauseVariable), NumberStyles.None, CultureInfo.InvariantCulture, out var ms) && ms > 0)
            AtomicFile.BeforeRenames = () => Thread.Sleep(ms);
    }

    /// <summary>Environment for a child that pauses <paramref name="ms"/> before renaming.</summary>
    public static Dictionary<string, string> PausingChild(int ms) => new()
    {
        ["DOTNET_STARTUP_HOOKS"] = typeof(StartupHook).Assembly.Location,
        [PauseVariable] = ms.ToString(CultureInfo.InvariantCulture),
    };
}
