namespace Readiness.Registries;

/// <summary>A feed answered, but not usefully: an HTTP error, a document that is not what the protocol promises,
/// a folder that is not there. The message is safe to show (no credentials) and says what to do where it can.</summary>
public sealed class FeedException : Exception
{
    public FeedException(string message)
        : base(message)
    {
    }

    public FeedException(string message, Exception inner)
        : base(message, inner)
    {
    }

    public FeedException()
    {
    }
}
