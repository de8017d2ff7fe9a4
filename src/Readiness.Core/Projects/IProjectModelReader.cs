using Readiness.Core.Snapshots;

namespace Readiness.Core.Projects;

/// <summary>Builds the project model from the files of a release candidate, statically.</summary>
public interface IProjectModelReader
{
    ProjectModel Read(IFileTree files);
}
