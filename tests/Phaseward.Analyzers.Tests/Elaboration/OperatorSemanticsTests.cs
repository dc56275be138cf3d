namespace Phaseward.Analyzers.Tests.Elaboration;

/// <summary>
/// Operators whose meaning a first reading of C# can miss, each design elaborated exactly as the compiled design runs it
/// (the oracle: the design compiled and run by .NET, <see cref="ParityTests"/>): <c>bool?</c>'s <c>&amp;</c> and
/// <c>|</c> are three-valued (C# specification, §12.13.5: <c>false &amp; null</c> is false, <c>true | null</c> is true),
/// and two delegates are equal when they call the same method on the same target (§12.12.9, delegate equality).
/// </summary>
public class OperatorSemanticsTests
{
    [Theory]
    [InlineData("Operators.LiftedAndWithFalse")]
    [InlineData("Operators.LiftedOrWithTrue")]
    [InlineData("Operators.LiftedWithNullStaysNull")]
    public void RunsAsAtRunTime(string design) => ParityTests.AssertParity(Designs, design);

    private static readonly InMemoryDesigns Designs = new(("/operators/Operators.cs", """
            using System;
            using Phaseward;

            namespace Operators
            {
                public abstract class Base : Design { protected void Chain(Circuit c, int n, string p) { var x = c.Input(p + "in"); for (var i = 0; i < n; i++) x = c.Inverter(x, p + i); c.Output(p + "out", x); } }
                public sealed class LiftedAndWithFalse : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        bool? unknownLane = null;
                        var n = (unknownLane & false) == false ? 3 : 1;
                        n += (false & unknownLane) == false ? 2 : 0;
                        Chain(c, n, "la");
                    }
                }
                public sealed class LiftedOrWithTrue : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        bool? unknownLane = null;
                        var n = (unknownLane | true) == true ? 3 : 1;
                        n += (true | unknownLane) is true ? 2 : 0;
                        Chain(c, n, "lo");
                    }
                }
                public sealed class LiftedWithNullStaysNull : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        bool? unknownLane = null;
                        var n = (unknownLane & true) is null ? 3 : 1;
                        n += (unknownLane | false) is null ? 2 : 0;
                        n += (unknownLane ^ true) is null ? 4 : 0;
                        Chain(c, n, "ln");
                    }
                }
            }
            """));
}
