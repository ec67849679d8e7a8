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
.EXAMPLE
    dotnet pwsh -NoProfile -File tests/bench/CompareEngine.ps1 -Baseline c1daeef -Sweep

    No timing: the 224 ring assessments of RingSweep by each build, compared number by number: the verdicts that
    differ, and for each quantity (peak current, temperature, energy, each mechanism's margin) the largest relative
    difference and where. -SweepOut names a folder to keep both builds' lines in (baseline.tsv, current.tsv).
#>
param(
    [Parameter(Mandatory = $true)]
    [string] $Baseline,
    [int] $Rounds = 4,
    [double] $Seconds = 3,
    [switch] $PulseBody,
    [switch] $Sweep,
    [string] $SweepOut
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

    if ($Sweep) {
        $lines = @{}
        foreach ($which in 'baseline', 'current') {
            $lines[$which] = @(& dotnet (Join-Path $builds[$which] 'InductionHazard.Benchmarks.dll') sweep)
            if ($LASTEXITCODE -ne 0) { throw "The sweep failed on the $which build." }
            if ($SweepOut) {
                New-Item -ItemType Directory -Force -Path $SweepOut | Out-Null
                Set-Content -Path (Join-Path $SweepOut "$which.tsv") -Value $lines[$which] -Encoding utf8
            }
        }

        function Read-Sweep([string[]] $text) {
            $rows = [ordered]@{}
            foreach ($line in $text) {
                $fields = $line -split "`t"
                $values = @{}
                foreach ($field in $fields[1..($fields.Count - 1)]) { $name, $value = $field -split '=', 2; $values[$name] = $value }
                $rows[$fields[0]] = $values
            }
            $rows
        }

        $before, $after = (Read-Sweep $lines.baseline), (Read-Sweep $lines.current)
        if ($before.Count -ne $after.Count) { throw "The builds gave $($before.Count) and $($after.Count) lines." }
        $largest = [ordered]@{}
        $verdicts = 0
        foreach ($key in $before.Keys) {
            $b, $a = $before[$key], $after[$key]
            if ($b.verdict -ne $a.verdict) { $verdicts++; "verdict changed: $key $($b.verdict) -> $($a.verdict)" }
            foreach ($name in $b.Keys) {
                if ($name -eq 'verdict') { continue }
                if (-not $a.ContainsKey($name)) { "$name not judged by the working tree: $key"; continue }
                $x, $y = [double]::Parse($b[$name], [cultureinfo]::InvariantCulture), [double]::Parse($a[$name], [cultureinfo]::InvariantCulture)
                if ($x -eq $y -or ([double]::IsNaN($x) -and [double]::IsNaN($y))) { $change = 0 } elseif ($x -eq 0 -or [double]::IsNaN($x) -or [double]::IsInfinity($x)) { $change = [double]::PositiveInfinity } else { $change = [math]::Abs($y - $x) / [math]::Abs($x) }
                if (-not $largest.Contains($name) -or $change -gt $largest[$name].Change) { $largest[$name] = [pscustomobject]@{ Change = $change; Key = $key; Before = $x; After = $y } }
            }

            foreach ($name in $a.Keys) {
                if (-not $b.ContainsKey($name)) { "$name judged by the working tree only: $key" }
            }
        }

        "$($before.Count) assessments; $verdicts verdicts changed"
        foreach ($name in $largest.Keys) {
            $l = $largest[$name]
            '{0,-12} largest relative change {1:E2} ({2}: {3:R} -> {4:R})' -f $name, $l.Change, $l.Key, $l.Before, $l.After
        }

        return
    }

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
