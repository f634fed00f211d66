namespace Helipol.Cli;

public static class Program
{
    public static int Main(string[] args) => CliApp.Run(args);
}
