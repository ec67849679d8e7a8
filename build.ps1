<#
.SYNOPSIS
    Builds, tests and demonstrates the InductionHazard module.
.DESCRIPTION
    Build  lays out a complete module folder in out/InductionHazard: the cmdlet assembly, the core and its
           dependencies, the manifest (with the version from Directory.Build.props), the format file and the
           help built from docs/cmdlets/*.md.
    Test   builds, runs the xunit tests, then the Pester tests against the laid-out module in a fresh
           PowerShell, and ends with one line: "N passed, N failed" (both suites counted).
    Demo   builds and runs the example audit of the invented site (examples/Invoke-SiteAudit.ps1), which
           writes its report to out/demo/marrowby-heath-audit.html (with .md and .csv beside it).
    Install  builds and copies the module folder into the current user's module path (the first entry of
           PSModulePath), so that Import-Module InductionHazard finds it from any PowerShell 7 shell.
    Validation  regenerates docs/validation.md from the tests' [Validates] tags (the test run checks it).
    Bench  runs the engine's benchmarks (tests/InductionHazard.Benchmarks, BenchmarkDotNet, short jobs) and the
           peak-memory comparison of loading a 1,000,000-row capture; results under out/bench.
    Clean  removes out/ and the bin and obj folders.
    Needs only the .NET SDK: run it as  dotnet tool restore && dotnet pwsh -NoProfile -File build.ps1 Test
.EXAMPLE
    dotnet tool restore && dotnet pwsh -NoProfile -File build.ps1 Demo
#>
[CmdletBinding()]
param(
    [Parameter(Position = 0)]
    [ValidateSet('Build', 'Test', 'Demo', 'Bench', 'Validation', 'Install', 'Clean')]
    [string[]] $Task = 'Build',

    [ValidateSet('Debug', 'Release')]
    [string] $Configuration = 'Release'
)

$ErrorActionPreference = 'Stop'
Set-StrictMode -Version Latest
$root = $PSScriptRoot
$out = Join-Path $root 'out'
$moduleDir = Join-Path $out 'InductionHazard'
$resultsDir = Join-Path $out 'test-results'

function Invoke-Native {
    param([string] $What, [scriptblock] $Command)
    & $Command
    if ($LASTEXITCODE -ne 0) { throw "$What failed (exit code $LASTEXITCODE)." }
}

function Invoke-FreshPwsh {
    # A new PowerShell process (the pinned local tool), so that the module is loaded from scratch.
    param([string[]] $Arguments)
    Push-Location $root
    try { & dotnet pwsh -NoProfile -NonInteractive @Arguments } finally { Pop-Location }
}

function Get-ModuleVersion {
    [xml] $props = Get-Content (Join-Path $root 'Directory.Build.props') -Raw
    $version = @($props.Project.PropertyGroup | ForEach-Object { $_.Version } | Where-Object { $_ })[0]
    if (-not $version) { throw 'Directory.Build.props has no <Version>.' }
    $version
}

function Invoke-Build {
    $publish = Join-Path $out 'publish'
    Invoke-Native 'dotnet publish' { dotnet publish (Join-Path $root 'src/InductionHazard.PowerShell') -c $Configuration -o $publish --nologo -v quiet }

    if (Test-Path $moduleDir) { Remove-Item $moduleDir -Recurse -Force }
    $null = New-Item -ItemType Directory -Path $moduleDir
    Get-ChildItem $publish -Filter *.dll |
        Where-Object Name -NotIn @('System.Management.Automation.dll') |
        Copy-Item -Destination $moduleDir
    Copy-Item (Join-Path $root 'src/InductionHazard.PowerShell/InductionHazard.format.ps1xml') $moduleDir

    $version = Get-ModuleVersion
    $manifest = Get-Content (Join-Path $root 'InductionHazard.psd1') -Raw
    $manifest = $manifest -replace "ModuleVersion(\s*)=(\s*)'[^']*'", "ModuleVersion`$1=`$2'$version'"
    Set-Content -Path (Join-Path $moduleDir 'InductionHazard.psd1') -Value $manifest -Encoding utf8NoBOM

    $helpDir = Join-Path $moduleDir 'en-US'
    $null = New-Item -ItemType Directory -Path $helpDir
    Copy-Item (Join-Path $root 'docs/about_*.help.txt') $helpDir
    Invoke-FreshPwsh @('-File', (Join-Path $root 'docs/tools/ConvertTo-MamlHelp.ps1'),
        '-ModulePath', (Join-Path $moduleDir 'InductionHazard.psd1'),
        '-MarkdownPath', (Join-Path $root 'docs/cmdlets'),
        '-OutputPath', (Join-Path $helpDir 'InductionHazard.dll-Help.xml'))
    if ($LASTEXITCODE -ne 0) { throw "Building the help failed (exit code $LASTEXITCODE)." }
    Write-Host "Module laid out in $moduleDir (version $version)."
}

function Get-XunitCounts {
    param([string] $TrxPath)
    if (-not (Test-Path $TrxPath)) { return @{ Passed = 0; Failed = 1; Note = 'no xunit results were written' } }
    [xml] $trx = Get-Content $TrxPath -Raw
    $counters = $trx.TestRun.ResultSummary.Counters
    $failed = [int] $counters.failed + [int] $counters.error + [int] $counters.timeout + [int] $counters.aborted
    @{ Passed = [int] $counters.passed; Failed = $failed }
}

function Invoke-Test {
    $passed = 0
    $failed = 0
    try {
        Invoke-Build
        if (Test-Path $resultsDir) { Remove-Item $resultsDir -Recurse -Force }
        $null = New-Item -ItemType Directory -Path $resultsDir

        Write-Host '--- xunit ---'
        & dotnet test (Join-Path $root 'tests/InductionHazard.Core.Tests') -c $Configuration --nologo `
            --logger 'trx;LogFileName=core.trx' --logger 'console;verbosity=minimal' --results-directory $resultsDir
        $xunit = Get-XunitCounts (Join-Path $resultsDir 'core.trx')
        $passed += $xunit.Passed
        $failed += $xunit.Failed

        Write-Host '--- Pester ---'
        $tools = Join-Path $out 'tools'
        Invoke-Native 'Restoring Pester' { dotnet restore (Join-Path $root 'tests/tools/Pester.proj') --packages $tools --nologo -v quiet }
        $pester = Join-Path $tools 'pester/6.2.0/tools/Pester.psd1'
        $pesterResult = Join-Path $resultsDir 'pester.json'
        Invoke-FreshPwsh @('-File', (Join-Path $root 'tests/Invoke-PesterSuite.ps1'),
            '-PesterPath', $pester, '-ModulePath', (Join-Path $moduleDir 'InductionHazard.psd1'), '-ResultPath', $pesterResult)
        if (Test-Path $pesterResult) {
            $counts = Get-Content $pesterResult -Raw | ConvertFrom-Json
            $passed += [int] $counts.Passed
            $failed += [int] $counts.Failed
        }
        else {
            Write-Warning 'Pester wrote no results.'
            $failed += 1
        }
    }
    catch {
        Write-Warning "The test run stopped: $_"
        $failed += 1
    }

    "$passed passed, $failed failed"
    if ($failed -gt 0) { exit 1 }
}

function Invoke-Demo {
    Invoke-Build
    Invoke-FreshPwsh @('-File', (Join-Path $root 'examples/Invoke-SiteAudit.ps1'),
        '-ModulePath', (Join-Path $moduleDir 'InductionHazard.psd1'),
        '-OutputDirectory', (Join-Path $out 'demo'), '-Force')
    if ($LASTEXITCODE -ne 0) { throw "The demo audit failed (exit code $LASTEXITCODE)." }
}

function Invoke-Bench {
    $project = Join-Path $root 'tests/InductionHazard.Benchmarks'
    $artifacts = Join-Path $out 'bench'
    Invoke-Native 'Building the benchmarks' { dotnet build $project -c Release --nologo -v quiet }
    Invoke-Native 'The benchmarks' { dotnet run --project $project -c Release --no-build -- --filter '*' --job short --artifacts $artifacts }
    foreach ($loader in 'baseline', 'capture') {
        Invoke-Native "The memory run ($loader)" { dotnet run --project $project -c Release --no-build -- memory $loader }
    }
}

function Invoke-Validation {
    $env:INDUCTIONHAZARD_WRITE_VALIDATION = '1'
    try {
        Invoke-Native 'Writing docs/validation.md' { dotnet test (Join-Path $root 'tests/InductionHazard.Core.Tests') -c $Configuration --nologo --filter 'FullyQualifiedName~ValidationTableTests' }
    }
    finally { Remove-Item Env:INDUCTIONHAZARD_WRITE_VALIDATION }
    Write-Host 'docs/validation.md regenerated from the tagged tests.'
}

function Invoke-Install {
    Invoke-Build
    $userModules = @($env:PSModulePath -split [IO.Path]::PathSeparator | Where-Object { $_ })[0]
    $target = Join-Path $userModules (Join-Path 'InductionHazard' (Get-ModuleVersion))
    if (Test-Path $target) { Remove-Item $target -Recurse -Force }
    $null = New-Item -ItemType Directory -Path $target -Force
    Copy-Item (Join-Path $moduleDir '*') $target -Recurse
    Write-Host "Installed in $target; in any PowerShell 7 shell: Import-Module InductionHazard"
}

function Invoke-Clean {
    if (Test-Path $out) { Remove-Item $out -Recurse -Force }
    Get-ChildItem $root -Include bin, obj -Recurse -Directory | Remove-Item -Recurse -Force
}

foreach ($t in $Task) {
    switch ($t) {
        'Build' { Invoke-Build }
        'Test' { Invoke-Test }
        'Demo' { Invoke-Demo }
        'Bench' { Invoke-Bench }
        'Validation' { Invoke-Validation }
        'Install' { Invoke-Install }
        'Clean' { Invoke-Clean }
    }
}
