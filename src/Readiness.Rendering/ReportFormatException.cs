namespace Readiness.Rendering;

/// <summary>A JSON report that does not follow schema <c>readiness-report/1</c>; the message names the JSON path.</summary>
public sealed class ReportFormatException : FormatException
{
    public ReportFormatException()
    {
    }

    public ReportFormatException(string message)
        : base(message)
    {
    }

    public ReportFormatException(string message, Exception innerException)
        : base(message, innerException)
    {
    }
}
