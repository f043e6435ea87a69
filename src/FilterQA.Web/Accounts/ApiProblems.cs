using Microsoft.AspNetCore.Mvc;

namespace FilterQA.Web.Accounts;

/// <summary>ProblemDetails answers for refused API calls (401, 403), written by the authentication handlers.</summary>
internal static class ApiProblems
{
    public static bool IsApi(HttpRequest request) => request.Path.StartsWithSegments("/api", StringComparison.OrdinalIgnoreCase);

    public static async Task WriteAsync(HttpContext context, int status, string title, string detail)
    {
        context.Response.StatusCode = status;
        IProblemDetailsService problems = context.RequestServices.GetRequiredService<IProblemDetailsService>();
        await problems.WriteAsync(new ProblemDetailsContext
        {
            HttpContext = context,
            ProblemDetails = new ProblemDetails { Status = status, Title = title, Detail = detail },
        }).ConfigureAwait(false);
    }
}
