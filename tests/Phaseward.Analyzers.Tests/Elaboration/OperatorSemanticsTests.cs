namespace Phaseward.Analyzers.Tests.Elaboration;

/// <summary>
/// Operators whose meaning a first reading of C# can miss, each design elaborated exactly as the compiled design runs it
/// (the oracle: the design compiled and run by .NET, <see cref="ParityTests"/>): <c>bool?</c>'s <c>&amp;</c> and
/// <c>|</c> are three-valued (C# specification, §12.13.5: <c>false &amp; null</c> is false, <c>true | null</c> is true),
/// two delegates are equal when they call the same method on the same target (§12.12.9, delegate equality), and a
/// deconstruction assignment fixes where each part goes before it evaluates the right side (§12.21.2, simple assignment;
/// the targets' receivers and indices left to right, then the value, then the stores).
/// </summary>
public class OperatorSemanticsTests
{
    [Theory]
    [InlineData("Operators.LiftedAndWithFalse")]
    [InlineData("Operators.LiftedOrWithTrue")]
    [InlineData("Operators.LiftedWithNullStaysNull")]
    [InlineData("Operators.MethodGroupsOfOneMethodAreEqual")]
    [InlineData("Operators.CombinedDelegatesCompareTheirLists")]
    [InlineData("Operators.UnsignedRightShift")]
    [InlineData("Operators.DeconstructionFixesIndicesFirst")]
    [InlineData("Operators.DeconstructionFixesReceiversFirst")]
    [InlineData("Operators.DeconstructionSwaps")]
    public void RunsAsAtRunTime(string design) => ParityTests.AssertParity(Designs, design);

    [Fact]
    public async System.Threading.Tasks.Task Two_delegates_from_one_lambda_are_PW9001()
    {
        // Equal in .NET when the lambda captures nothing it caches, or both come from one scope's closure object: not modelled.
        var source = InverterChainDesign.Source("Quarry", "", "", """
            System.Func<int> Make() => () => 2;
            var same = {|#0:Make() == Make()|};
            count = same ? 4 : 1;
            """);
        await new Verifiers.PhasewardAnalyzerTest<ElaborationAnalyzer>(source,
            InverterChainDesign.NotElaborated(0, "the equality of two delegates made from one lambda",
                "C# compares the objects their captured variables live in, which the elaborator does not model")).RunAsync();
        InverterChainDesign.AssertNoStage(source, "Quarry");
    }

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
                public sealed class MethodGroupsOfOneMethodAreEqual : Base
                {
                    private int taps;
                    private void Tap() => taps++;
                    private static void Idle() { }
                    protected override void Describe(Circuit c)
                    {
                        Action first = Tap, second = Tap, other = Idle, again = Idle;
                        var n = (first == second ? 3 : 1) + (first != other ? 2 : 0) + (other == again ? 4 : 0);
                        Action? none = null;
                        n += none == null ? 1 : 0;
                        Chain(c, n, "mg");
                    }
                }
                public sealed class CombinedDelegatesCompareTheirLists : Base
                {
                    private void Tap() { }
                    private void Hold() { }
                    protected override void Describe(Circuit c)
                    {
                        Action both = Tap;
                        both += Hold;
                        Action same = Tap;
                        same += Hold;
                        Action reversed = Hold;
                        reversed += Tap;
                        Action single = Tap;
                        var n = (both == same ? 3 : 1) + (both == reversed ? 10 : 0) + (both == single ? 20 : 0);
                        Chain(c, n, "cd");
                    }
                }
                public sealed class UnsignedRightShift : Base
                {
                    // >>> shifts zeros in from the left whatever the sign (C# 11; C# specification, shift operators).
                    protected override void Describe(Circuit c)
                    {
                        var mask = -16;
                        long wide = -1L;
                        var shifts = 2;
                        var n = (mask >>> 28) + (int)(wide >>> 62) + (mask >> 30 == -1 ? 1 : 0) + (7 >>> 1) + (mask >>> shifts == 0x3FFFFFFC ? 2 : 0);
                        mask >>>= 30;
                        Chain(c, n + mask, "us");
                    }
                }
                public sealed class Cell { public int W = 1; }
                public sealed class DeconstructionFixesIndicesFirst : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var taps = new int[3];
                        var j = 0;
                        (j, taps[j]) = (2, 9);
                        Chain(c, taps[0] + taps[2] * 10 + j, "di");
                    }
                }
                public sealed class DeconstructionFixesReceiversFirst : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var first = new Cell();
                        var second = new Cell();
                        var current = first;
                        (current, current.W) = (second, 5);
                        Chain(c, first.W * 2 + second.W, "dr");
                    }
                }
                public sealed class DeconstructionSwaps : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var (low, high) = (4, 1);
                        (low, high) = (high, low);
                        var lanes = new[] { 1, 2, 3 };
                        (lanes[0], lanes[2]) = (lanes[2], lanes[0]);
                        Chain(c, low + high * 2 + lanes[0], "ds");
                    }
                }
            }
            """));
}
