using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.AspNetCore.Mvc;

namespace FilterQA.Web.Api;

/// <summary>ProblemDetails answers of the API, each naming what was wrong.</summary>
public static class Problems
{
    public static ProblemHttpResult Make(int status, string title, string detail, IDictionary<string, object?>? extensions = null)
    {
        var problem = new ProblemDetails { Status = status, Title = title, Detail = detail };
        if (extensions is not null)
        {
            foreach ((string key, object? value) in extensions)
            {
                problem.Extensions[key] = value;
            }
        }
        return TypedResults.Problem(problem);
    }
}
