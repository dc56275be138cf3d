using System;
using Microsoft.CodeAnalysis;
using Phaseward.Checking;
using Phaseward.Netlists;

namespace Phaseward.Analyzers.Elaboration;

// Reporting (PW9001, PW9003, once per site and call chain), the budgets that stop a runaway design (PW9002: steps,
// call depth) and the chain of calls that led to the code being interpreted.
internal sealed partial class Interpreter
{
    // ---- reporting ----

    /// <summary>Reports PW9001 once for this site and returns <see cref="Unknown"/>.</summary>
    public object Unsupported(IOperation operation, string what, string why) => Unsupported(operation.Syntax, what, why);

    /// <summary>Reports PW9001 once for this site and returns <see cref="Unknown"/>.</summary>
    public object Unsupported(SyntaxNode site, string what, string why)
    {
        Report(RuleCatalog.NotElaborated.Id, site, what, why, DesignName);
        return Unknown.Value;
    }

    /// <summary>
    /// A field, local, property or element of a library struct outside the pure library (DateTime, Guid, a generic library
    /// struct) read while it still holds its default, which the elaborator does not make: PW9001 at the read, naming it.
    /// </summary>
    private object ReadOfUnmadeDefault(IOperation read, UnmadeDefault unread)
        => Unsupported(read, "the default value of " + Describe(unread.Type), "'" + read.Syntax + "' is read before a value is assigned to it, and " + WhyNotMade(unread));

    private static string WhyNotMade(UnmadeDefault unread) => unread.Type is ITypeParameterSymbol
        ? "the type argument it stands for is not known where the generic code is interpreted"
        : "the default of a library struct outside the pure library is not made at compile time";

    /// <summary>
    /// What a library call (or an interpreted ToString, Equals, GetHashCode it made) gives when it met a value that is not
    /// known: Unknown, reported once more only when the value is an unmade library-struct default (its first report).
    /// </summary>
    private object UnknownFrom(UnknownValueException exception, IOperation site)
        => exception.Unread is { } unread
            ? Unsupported(site, "the default value of " + Describe(unread.Type),
                "a value used here holds it (a field or element never assigned), and " + WhyNotMade(unread))
            : Unknown.Value;

    /// <summary>Reports PW9003 at the site: the design throws here when it runs.</summary>
    public void Throws(SyntaxNode site, string message)
    {
        if (tryDepth > 0)
            throw new DesignException(ExceptionNamed(message), site);
        Report(RuleCatalog.DesignThrows.Id, site, DesignName, message);
        if (++throws >= MaxThrows && !Silent)
            throw new ElaborationStopped();
    }

    public void Report(string ruleId, SyntaxNode site, params string[] arguments)
    {
        if (Silent)
            return;
        var span = SourceSites.For(site, callers);
        var key = (span.Path, span.Start, callers.Length > 0 ? callers[0].Start : -1);
        if (reportedSites.Add(key))
            issues.Add(new ElaborationIssue(ruleId, span, arguments));
    }

    // ---- budgets ----

    /// <summary>Counts one step (a loop iteration or a call) and honours cancellation.</summary>
    private void Step(IOperation site)
    {
        cancellationToken.ThrowIfCancellationRequested();
        if (++Steps > limits.StepBudget)
        {
            var where = loops.Count > 0 ? loops.Peek() : site;
            Report(RuleCatalog.ElaborationBudgetExceeded.Id, where.Syntax, DesignName,
                $"the step budget of {limits.StepBudget} steps (loop iterations and calls; phaseward.elaboration_step_budget) is used up");
            throw new ElaborationStopped();
        }
    }

    private void EnterCall(IOperation site)
    {
        if (++depth > limits.RecursionLimit || !HasStackRoom())
        {
            depth--;
            Report(RuleCatalog.ElaborationBudgetExceeded.Id, site.Syntax, DesignName,
                $"calls nest deeper than the limit of {limits.RecursionLimit} (phaseward.elaboration_recursion_limit)");
            throw new ElaborationStopped();
        }
    }

    private void LeaveCall() => depth--;

    private static bool HasStackRoom()
    {
        try
        {
            System.Runtime.CompilerServices.RuntimeHelpers.EnsureSufficientExecutionStack();
            return true;
        }
        catch (InsufficientExecutionStackException)
        {
            return false;
        }
    }

    private void PushCaller(SyntaxNode site)
    {
        if (!chains.TryGetValue((callers, site), out var next))
        {
            next = new SourceSpan[callers.Length + 1];
            Array.Copy(callers, next, callers.Length);
            next[callers.Length] = SourceSites.For(site, callers);
            chains.Add((callers, site), next);
        }

        callers = next;
    }

    private SemanticModel ModelOf(SyntaxNode node) => session.Models.Get(node.SyntaxTree);

    private static string Describe(ISymbol symbol) => "'" + symbol.ToDisplayString(SymbolDisplayFormat.CSharpShortErrorMessageFormat) + "'";
}
