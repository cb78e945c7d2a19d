using CellCheck.Core.Planning;
using CellCheck.Core.Problems;
using CellCheck.IO.Data;
using CellCheck.IO.Design;

namespace CellCheck.IO.Planning;

/// <summary>Reads a design and its data, checks the plan options and plans the next run: the whole job between the files and the plan report.</summary>
public static class PlanRun
{
    public static LoadResult<PlanRunResult> Run(string designPath, PlanArguments args)
    {
        ArgumentNullException.ThrowIfNull(args);
        var design = DesignReader.Read(designPath);
        if (!design.Ok)
        {
            return LoadResult<PlanRunResult>.Failure(design.Problems);
        }

        var file = design.Value!;
        var request = PlanRequestReader.Read(args, file.Alpha);
        var responses = new List<int>();
        var problems = new List<Problem>(request.Problems);
        var names = file.Responses.Select(r => r.Name).ToList();
        foreach (var wanted in args.Responses ?? [])
        {
            var index = names.IndexOf(wanted);
            if (index < 0)
            {
                var near = Suggest.Closest(wanted, names);
                problems.Add(new Problem(ProblemCodes.PlanUnknownResponse, PlanRequestReader.CommandLine + " (--response)", null, null,
                    $"The design has no response '{wanted}'.", near is null ? "Use one of: " + string.Join(", ", names) + "." : $"Did you mean '{near}'?"));
            }
            else if (!responses.Contains(index))
            {
                responses.Add(index);
            }
        }

        if (problems.Count > 0)
        {
            return LoadResult<PlanRunResult>.Failure(problems);
        }

        var data = DataReader.Read(file);
        if (!data.Ok)
        {
            return LoadResult<PlanRunResult>.Failure(data.Problems);
        }

        if (responses.Count == 0)
        {
            responses.AddRange(Enumerable.Range(0, names.Count));
        }

        var plan = DesignPlanner.Plan(data.Value!, ModelSpecs.From(file), request.Value!, responses, file.Adjust);
        return LoadResult<PlanRunResult>.Success(new PlanRunResult(file, plan));
    }
}
