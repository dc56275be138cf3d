namespace Phaseward.Analyzers.Tests.Elaboration;

/// <summary>
/// An <c>in</c> argument is a read-only reference to the caller's variable (C# specification, §15.6.2.3, input
/// parameters): what the callee writes to that variable another way during the call (a <c>ref</c> argument, a field)
/// shows through it. Each design is elaborated exactly as the compiled design runs it (the oracle: the design compiled
/// and run by .NET, <see cref="ParityTests"/>). Before, an <c>in</c> argument was copied at the call, silently.
/// </summary>
public class ArgumentPassingTests
{
    [Theory]
    [InlineData("Arguments.InAndRefOfOneLocal")]
    [InlineData("Arguments.InFieldWrittenByTheCallee")]
    [InlineData("Arguments.InOfAValueIsATemporary")]
    [InlineData("Arguments.InStructSeesTheCallersStruct")]
    public void RunsAsAtRunTime(string design) => ParityTests.AssertParity(Designs, design);

    private static readonly InMemoryDesigns Designs = new(("/arguments/Arguments.cs", """
            using Phaseward;

            namespace Arguments
            {
                public abstract class Base : Design { protected void Chain(Circuit c, int n, string p) { var x = c.Input(p + "in"); for (var i = 0; i < n; i++) x = c.Inverter(x, p + i); c.Output(p + "out", x); } }
                public struct Span2 { public int Low; public int High; }
                public sealed class InAndRefOfOneLocal : Base
                {
                    private static int Peek(in int seen, ref int written) { written = 7; return seen; }
                    protected override void Describe(Circuit c)
                    {
                        var depth = 1;
                        Chain(c, Peek(in depth, ref depth), "ir");
                    }
                }
                public sealed class InFieldWrittenByTheCallee : Base
                {
                    private int taps = 2;
                    private int Grow(in int before) { taps = 5; return before + taps; }
                    protected override void Describe(Circuit c) => Chain(c, Grow(in taps), "if");
                }
                public sealed class InOfAValueIsATemporary : Base
                {
                    private int taps = 2;
                    private int Grow(in int before) { taps = 5; return before + taps; }
                    protected override void Describe(Circuit c) => Chain(c, Grow(taps + 1), "it");
                }
                public sealed class InStructSeesTheCallersStruct : Base
                {
                    private static int Width(in Span2 span, ref Span2 same) { same.High = 6; return span.High - span.Low; }
                    protected override void Describe(Circuit c)
                    {
                        var span = new Span2 { Low = 1, High = 3 };
                        Chain(c, Width(in span, ref span), "is");
                    }
                }
            }
            """));
}
