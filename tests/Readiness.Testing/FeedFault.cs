namespace Readiness.Testing;

/// <summary>How <see cref="LocalHttpFeed"/> misbehaves on the paths its fault applies to.</summary>
public enum FeedFault
{
    /// <summary>Answers as the protocol says.</summary>
    None,

    /// <summary>HTTP 500.</summary>
    ServerError,

    /// <summary>Waits <see cref="LocalHttpFeed.Delay"/> before answering normally.</summary>
    Slow,

    /// <summary>HTTP 200 with a body that is not valid JSON.</summary>
    MalformedJson,
}
