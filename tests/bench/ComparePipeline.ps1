<#
.SYNOPSIS
    Times rows already imported (20,000 rings, rings of ten sizes or with -DistinctRows each of its own size) through
    Test-InductionHazard with the module of an earlier commit and with the working tree's, each in a fresh shell of
    its own, the shells alternating, and prints the fastest pass of each and their ratio. Import-Csv is left out (it
    is the same for both) and each shell times many passes, so that a change of a fraction of a microsecond a row
    shows through this machine's noise, which Pipeline.ps1's three rounds from the file do not resolve.
.EXAMPLE
    dotnet pwsh -NoProfile -File tests/bench/ComparePipeline.ps1 -Baseline 60a52e0
#>
param(
    [Parameter(Mandatory = $true)]
    [string] $Baseline,
    [int] $Rounds = 4,
    [int] $Passes = 40,
    [int] $Rows = 20000,
    [switch] $DistinctRows
)
$ErrorActionPreference = 'Stop'
$root = (Resolve-Path (Join-Path $PSScriptRoot '../..')).Path
$work = Join-Path ([IO.Path]::GetTempPath()) ('induction-hazard-pipeline-' + [guid]::NewGuid().ToString('N').Substring(0, 8))
$tree = Join-Path $work 'baseline'
git -C $root worktree add --detach $tree $Baseline 2>&1 | Out-Null
if ($LASTEXITCODE -ne 0) { throw "Could not check out $Baseline." }
try {
    $modules = [ordered]@{}
    foreach ($pair in @(@('baseline', $tree), @('current', $root))) {
        & dotnet pwsh -NoProfile -File (Join-Path $pair[1] 'build.ps1') Build | Out-Null
        if ($LASTEXITCODE -ne 0) { throw "Building the module at $($pair[1]) failed." }
        $modules[$pair[0]] = Join-Path $pair[1] 'out/InductionHazard/InductionHazard.psd1'
    }

    # One shell's passes: the rows made in memory, a warm-up, then the fastest of the passes, in seconds.
    $pass = Join-Path $work 'pass.ps1'
    Set-Content $pass -Value @'
param([string] $Module, [int] $Rows, [int] $Passes, [int] $Distinct)
Import-Module $Module
$lines = [System.Collections.Generic.List[string]]::new()
$lines.Add('Name,Material,Diameter,WireDiameter,Contact')
foreach ($k in 1..$Rows) {
    $diameter = if ($Distinct) { (18 + 10.0 * $k / $Rows).ToString('R', [cultureinfo]::InvariantCulture) } else { 18 + ($k % 10) }
    $lines.Add("Ring $k,Copper,$diameter mm,2 mm,Skin")
}
$records = $lines | ConvertFrom-Csv
$sources = [ordered]@{
    sine = New-FieldWaveform -Sine -Amplitude '10 mT' -Frequency '50 Hz' | New-FieldSource
    ramp = New-FieldWaveform -Ramp -From '0 T' -To '1 T' -Duration '10 ms' | New-FieldSource
}
foreach ($name in $sources.Keys) {
    $records | Select-Object -First 500 | Test-InductionHazard -Source $sources[$name] | Out-Null
    $best = [double]::MaxValue
    foreach ($p in 1..$Passes) {
        $t = (Measure-Command { $records | Test-InductionHazard -Source $sources[$name] | Out-Null }).TotalSeconds
        if ($t -lt $best) { $best = $t }
    }
    "$name $best"
}
'@

    $best = @{}
    foreach ($round in 1..$Rounds) {
        foreach ($which in $modules.Keys) {
            foreach ($line in & dotnet pwsh -NoProfile -File $pass -Module $modules[$which] -Rows $Rows -Passes $Passes -Distinct ([int][bool]$DistinctRows)) {
                $name, $seconds = $line -split ' '
                $key = "$which/$name"
                if (-not $best.ContainsKey($key) -or [double]$seconds -lt $best[$key]) { $best[$key] = [double]$seconds }
            }
        }
    }

    $kind = if ($DistinctRows) { 'every ring its own size' } else { 'rings of ten sizes' }
    foreach ($name in 'sine', 'ramp') {
        '{0,-5} ({1}) {2}: {3:F4} s ({4:F2} us a row)   working tree: {5:F4} s ({6:F2} us a row)   ratio {7:F2}  (fastest of {8} passes in each of {9} alternate shells)' -f $name, $kind, $Baseline,
            $best["baseline/$name"], (1e6 * $best["baseline/$name"] / $Rows), $best["current/$name"], (1e6 * $best["current/$name"] / $Rows),
            ($best["current/$name"] / $best["baseline/$name"]), $Passes, $Rounds
    }
}
finally {
    git -C $root worktree remove --force $tree 2>&1 | Out-Null
    Remove-Item $work -Recurse -Force -ErrorAction SilentlyContinue
}
