using System.Runtime.CompilerServices;

namespace Phaseward.Tests.Support;

/// <summary>Where the test itself is: call it on the same line as the DSL call whose span is checked.</summary>
internal static class Here
{
    public static int Line([CallerLineNumber] int line = 0) => line;

    public static string File([CallerFilePath] string path = "") => path;
}
