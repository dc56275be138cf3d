using System;

namespace Phaseward.Cli;

public static class Program
{
    public static int Main(string[] args) => ReportCommand.Run(args, Console.Out, Console.Error);
}
