namespace Helipol.Cli;

/// <summary>Builds the command tree. Each verb lives in its own file under Verbs/.</summary>
public static class CliApp
{
    public static int Run(string[] args)
    {
        Console.Error.WriteLine("helipol: no verbs yet");
        return 2;
    }
}
