namespace Readiness.Core.Checks;

/// <summary>
/// One check: a pure function over an immutable <see cref="CheckContext"/>. It returns one finding per subject it
/// looks at. A check that throws becomes an <c>error</c> result; the run goes on.
/// </summary>
public interface ICheck
{
    CheckDescriptor Descriptor { get; }

    IEnumerable<Finding> Run(CheckContext context);
}
