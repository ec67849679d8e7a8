<#
.SYNOPSIS
    Runs 20,000 rows already imported, every ring a size of its own, through Test-InductionHazard again and again in
    one shell (a continuous 10 mT, 50 Hz sine), and prints each pass's wall time and the CPU time the process spent on
    it, in all and a row: what -ThrottleLimit N costs in CPU against a serial run once the shell is warm, which the
    first passes (the runtime compiling the module's code) hide.
.EXAMPLE
    dotnet pwsh -NoProfile -File tests/bench/ThreadCpu.ps1 -ThrottleLimit 2 -Passes 16
#>
param(
    [string] $ModulePath = (Join-Path $PSScriptRoot '../../out/InductionHazard/InductionHazard.psd1'),
    [int] $ThrottleLimit = 1,
    [int] $Passes = 12,
    [int] $Rows = 20000
)
Import-Module $ModulePath
$invariant = [cultureinfo]::InvariantCulture
$items = foreach ($k in 1..$Rows) {
    [pscustomobject]@{ Name = "Ring $k"; Material = 'Copper'; Diameter = ((18 + 10.0 * $k / $Rows).ToString('R', $invariant) + ' mm'); WireDiameter = '2 mm'; Contact = 'Skin' }
}
$source = New-FieldWaveform -Sine -Amplitude '10 mT' -Frequency '50 Hz' | New-FieldSource
$process = [System.Diagnostics.Process]::GetCurrentProcess()
foreach ($pass in 1..$Passes) {
    $process.Refresh()
    $cpu0 = $process.TotalProcessorTime
    $wall = Measure-Command { $items | Test-InductionHazard -Source $source -ThrottleLimit $ThrottleLimit | Out-Null }
    $process.Refresh()
    $cpu = ($process.TotalProcessorTime - $cpu0).TotalSeconds
    '{0,2}: {1:F3} s wall, {2:F3} s CPU ({3:F2} cores), {4:F1} us of CPU a row' -f $pass, $wall.TotalSeconds, $cpu, ($cpu / $wall.TotalSeconds), (1e6 * $cpu / $Rows)
}
