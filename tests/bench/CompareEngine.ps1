<#
.SYNOPSIS
    Times the ring assessments of the engine benchmark (a continuous sine, ramps in 10 ms and in 1 s, and an inventory
    row: a ring of its own read from text and assessed in the 10 ms ramp), and the reading alone of a row whose ring is
    a size of its own ("readrow": its item, placement and inventory columns), at an earlier
    commit and at the working tree, alternately in one session, and prints the fastest round of each and their ratio:
    this machine is noisy, so only a comparison made side by side in the same run says what a change did.
.EXAMPLE
    dotnet pwsh -NoProfile -File tests/bench/CompareEngine.ps1 -Baseline 9df9151
.EXAMPLE
    dotnet pwsh -NoProfile -File tests/bench/CompareEngine.ps1 -Baseline 37d2c75 -PulseBody

    The cases of PulseBodyBenchmarks instead: a ring and a solid body (given its normal, and not) beside a pulse coil,
    in milliseconds.
#>
param(
    [Parameter(Mandatory = $true)]
    [string] $Baseline,
    [int] $Rounds = 4,
    [double] $Seconds = 3,
    [switch] $PulseBody
)
$ErrorActionPreference = 'Stop'
$root = (Resolve-Path (Join-Path $PSScriptRoot '../..')).Path
$work = Join-Path ([IO.Path]::GetTempPath()) ('induction-hazard-compare-' + [guid]::NewGuid().ToString('N').Substring(0, 8))
$tree = Join-Path $work 'baseline'
$builds = @{ baseline = Join-Path $work 'bin-baseline'; current = Join-Path $work 'bin-current' }
git -C $root worktree add --detach $tree $Baseline 2>&1 | Out-Null
if ($LASTEXITCODE -ne 0) { throw "Could not check out $Baseline." }
try {
    # The same benchmark program for both: today's, built once against each commit's engine.
    $project = Join-Path $tree 'tests/InductionHazard.Benchmarks'
    Remove-Item $project -Recurse -Force -ErrorAction SilentlyContinue
    Copy-Item (Join-Path $root 'tests/InductionHazard.Benchmarks') $project -Recurse -Exclude 'bin', 'obj'
    dotnet build $project -c Release --nologo -v quiet -o $builds.baseline | Out-Null
    if ($LASTEXITCODE -ne 0) { throw "Building the benchmark against $Baseline failed." }
    dotnet build (Join-Path $root 'tests/InductionHazard.Benchmarks') -c Release --nologo -v quiet -o $builds.current | Out-Null
    if ($LASTEXITCODE -ne 0) { throw 'Building the benchmark against the working tree failed.' }

    $best = @{}
    foreach ($round in 1..$Rounds) {
        foreach ($which in 'baseline', 'current') {
            foreach ($line in & dotnet (Join-Path $builds[$which] 'InductionHazard.Benchmarks.dll') $(if ($PulseBody) { 'pulse-loop' } else { 'loop' }) $Seconds) {
                $name, $us, $null = $line -split ' '
                $key = "$which/$name"
                if (-not $best.ContainsKey($key) -or [double]$us -lt $best[$key]) { $best[$key] = [double]$us }
            }
        }
    }

    $names, $unit = if ($PulseBody) { @('ring', 'drift-given', 'drift'), 'ms' } else { @('sine', 'ramp10ms', 'ramp1s', 'row', 'readrow'), 'us' }
    foreach ($name in $names) {
        '{0,-11} {1}: {2,8:F2} {6}   working tree: {3,8:F2} {6}   ratio {4:F2}  (fastest of {5} alternate rounds)' -f $name, $Baseline, $best["baseline/$name"], $best["current/$name"], ($best["current/$name"] / $best["baseline/$name"]), $Rounds, $unit
    }
}
finally {
    git -C $root worktree remove --force $tree 2>&1 | Out-Null
    Remove-Item $work -Recurse -Force -ErrorAction SilentlyContinue
}
