namespace FlowCert.Tests.Validation;

/// <summary>
/// Asks Debian's z3 a batch of satisfiability questions in one process, each followed by (check-sat) and
/// (reset), with a per-question timeout; answers are "sat", "unsat" or "unknown" (timeout), in order.
/// (reset) rather than push/pop: in incremental mode z3 4.8 skipped the preprocessing that makes the
/// mod-p questions easy, and one question that takes 1.5 s on its own timed out after 20 s.
/// smt.arith.solver=2 (z3's other arithmetic core): on the hardest mod-7 "no flow" question of the
/// sample it answers in 0.08 s where the default core needed 12 s (measured with z3 4.8.12).
/// </summary>
public static class Z3Runner
{
    public static IReadOnlyList<string> CheckAll(IReadOnlyList<string> problems, int secondsPerQuestion = 20)
    {
        var script = new System.Text.StringBuilder();
        foreach (var p in problems) script.Append(p).Append("(check-sat)\n(reset)\n");
        var hardLimit = secondsPerQuestion * problems.Count + 10;
        var text = PipedProgram.Run("z3", "z3", ["-smt2", "-in", "smt.arith.solver=2", $"-t:{secondsPerQuestion * 1000}", $"-T:{hardLimit}"], script.ToString());
        var answers = text.Split('\n', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries);
        if (answers.Length != problems.Count || answers.Any(a => a is not ("sat" or "unsat" or "unknown")))
            throw new Xunit.Sdk.XunitException($"unexpected z3 output for {problems.Count} questions:\n{text}");
        return answers;
    }
}
