@{
    RootModule             = 'InductionHazard.dll'
    ModuleVersion          = '0.1.0'
    CompatiblePSEditions   = @('Desktop', 'Core')
    GUID                   = '6f0c9c1e-3d0a-4c7e-9f57-2b4d8e1a7c35'
    Author                 = 'InductionHazard contributors'
    CompanyName            = 'InductionHazard contributors'
    Copyright              = 'Copyright (c) 2026 InductionHazard contributors. MIT License.'
    Description            = 'Checks conductive items (rings, bracelets, tools, fixtures) for induction hazards near strong or switching magnetic fields: emf, gap voltage, circulating current, heating, contact burns, with published limits and fail-closed verdicts. Results are engineering estimates; local codes, site rules and licensed practice govern.'
    PowerShellVersion      = '5.1'
    DotNetFrameworkVersion = '4.7.2'
    FormatsToProcess       = @('InductionHazard.format.ps1xml')
    CmdletsToExport        = @(
        'New-FieldWaveform'
        'New-FieldSource'
        'New-ConductiveItem'
        'Get-ConductorMaterial'
        'Test-FieldExposure'
        'Get-InductionResponse'
        'Test-InductionHazard'
        'Get-FieldStrength'
        'Import-HazardSite'
        'Export-HazardReport'
        'Get-HazardPolicy'
        'Find-SafeDistance'
    )
    FunctionsToExport      = @()
    VariablesToExport      = @()
    AliasesToExport        = @()
    PrivateData            = @{
        PSData = @{
            Tags       = @('Safety', 'Induction', 'MagneticField', 'EMF', 'Electromagnetism', 'Engineering')
        }
    }
}
