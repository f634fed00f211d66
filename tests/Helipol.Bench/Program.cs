namespace Helipol.Bench;

public static class Program
{
    public static int Main(string[] args)
    {
        Console.WriteLine("helipol bench: no benchmarks yet");
        return 0;
    }
}
