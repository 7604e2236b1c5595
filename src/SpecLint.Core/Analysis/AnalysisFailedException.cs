namespace SpecLint.Core.Analysis;

/// <summary>
/// The analysis of an operating point could not produce its figures: a solver did not converge, or the values
/// leave a figure undefined (for example a default noise band that is empty). Callers report it as a finding.
/// </summary>
public sealed class AnalysisFailedException : ArithmeticException
{
    /// <summary>Creates the exception.</summary>
    public AnalysisFailedException()
    {
    }

    /// <summary>Creates the exception with a message that says what failed.</summary>
    /// <param name="message">What failed, in the user's terms.</param>
    public AnalysisFailedException(string message)
        : base(message)
    {
    }

    /// <summary>Creates the exception around the solver's own exception.</summary>
    /// <param name="message">What failed, in the user's terms.</param>
    /// <param name="innerException">The solver's exception.</param>
    public AnalysisFailedException(string message, Exception innerException)
        : base(message, innerException)
    {
    }

    /// <summary>
    /// True for every exception a numerical failure of the analysis can raise: this type and any other
    /// <see cref="ArithmeticException"/>, and MathNet's non-convergence exception, which does not derive from it.
    /// </summary>
    /// <param name="e">The exception.</param>
    public static bool IsNumericalFailure(Exception e) =>
        e is ArithmeticException or MathNet.Numerics.NonConvergenceException;
}
