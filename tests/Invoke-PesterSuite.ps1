<#
.SYNOPSIS
    Runs the Pester tests against a laid-out module and writes the counts for build.ps1.
.DESCRIPTION
    Imports Pester from the given path (restored as a package by build.ps1), runs every tests/*.Tests.ps1 with
    the module's manifest path as container data, and writes {"Passed":N,"Failed":N} to -ResultPath.
#>
[CmdletBinding()]
param(
    [Parameter(Mandatory)] [string] $PesterPath,
    [Parameter(Mandatory)] [string] $ModulePath,
    [Parameter(Mandatory)] [string] $ResultPath
)

$ErrorActionPreference = 'Stop'
Import-Module $PesterPath -Force
$container = New-PesterContainer -Path (Join-Path $PSScriptRoot '*.Tests.ps1') -Data @{ ModulePath = $ModulePath }
$configuration = New-PesterConfiguration
$configuration.Run.Container = $container
$configuration.Run.PassThru = $true
$configuration.Output.Verbosity = 'Normal'
if ([Console]::IsOutputRedirected) { $configuration.Output.RenderMode = 'Plaintext' }
$result = Invoke-Pester -Configuration $configuration
$failed = $result.FailedCount + $result.FailedBlocksCount + $result.FailedContainersCount
@{ Passed = $result.PassedCount; Failed = $failed } | ConvertTo-Json | Set-Content -Path $ResultPath -Encoding utf8
