using System;
using Phaseward.Netlists;

namespace Phaseward.Tests.Support;

/// <summary>
/// Checks a rejected DSL call: the exact exception type, the parameter it names, the offending value in its message,
/// and a circuit left exactly as it was (canonical netlist text with spans, device count, process).
/// </summary>
internal static class Rejection
{
    public static TException Expect<TException>(Circuit circuit, Action call, string parameter, params string[] valueFragments)
        where TException : ArgumentException
    {
        var before = Snapshot(circuit);
        var process = circuit.Process;

        var error = Assert.Throws<TException>(call);

        Assert.Equal(parameter, error.ParamName);
        Assert.Contains("'" + parameter + "'", error.Message, StringComparison.Ordinal);
        foreach (var fragment in valueFragments)
            Assert.Contains(fragment, error.Message, StringComparison.Ordinal);
        Assert.Equal(before, Snapshot(circuit));
        Assert.Same(process, circuit.Process);
        return error;
    }

    /// <summary>An ArgumentException naming the parameter and (quoted fragments of) the value.</summary>
    public static ArgumentException Argument(Circuit circuit, Action call, string parameter, params string[] valueFragments)
        => Expect<ArgumentException>(circuit, call, parameter, valueFragments);

    /// <summary>An ArgumentNullException naming the parameter; its message says the value was null.</summary>
    public static ArgumentNullException Null(Circuit circuit, Action call, string parameter)
        => Expect<ArgumentNullException>(circuit, call, parameter, "null");

    public static string Snapshot(Circuit circuit)
        => NetlistText.Write(circuit.ToNetlist(), includeSpans: true) + "devices=" + circuit.DeviceCount;
}
