param([string] $ModulePath = (Join-Path $PSScriptRoot '../out/InductionHazard/InductionHazard.psd1'))

BeforeDiscovery {
    $commands = (Import-Module $ModulePath -Force -PassThru).ExportedCmdlets.Keys | ForEach-Object { @{ Name = $_ } }
}

BeforeAll {
    Import-Module $ModulePath -Force
    $root = Split-Path $PSScriptRoot -Parent
    $common = [System.Management.Automation.Cmdlet]::CommonParameters + [System.Management.Automation.Cmdlet]::OptionalCommonParameters
}

Describe 'Help for <Name>' -ForEach $commands {
    BeforeAll {
        $help = Get-Help $Name -Full
        $command = Get-Command $Name
    }

    It 'has a synopsis and a description' {
        $help.Synopsis | Should -Not -BeNullOrEmpty
        $help.Synopsis | Should -Not -Match ('^' + [regex]::Escape($Name) + ' \[') -Because 'a synopsis that is only the syntax means the help file was not found'
        ($help.description.Text -join ' ') | Should -Not -BeNullOrEmpty
    }

    It 'describes every parameter' {
        foreach ($p in $command.Parameters.Keys | Where-Object { $_ -notin $common }) {
            $described = $help.parameters.parameter | Where-Object name -EQ $p
            ($described.description.Text -join ' ') | Should -Not -BeNullOrEmpty -Because "-$p needs a description"
        }
    }

    It 'has at least two examples' {
        @($help.examples.example).Count | Should -BeGreaterOrEqual 2
    }

    It 'has examples that run as written' {
        Push-Location $root
        try {
            foreach ($example in $help.examples.example) {
                $code = $example.code
                { $null = & ([scriptblock]::Create($code)) 3>$null } | Should -Not -Throw -Because $example.title
            }
        }
        finally { Pop-Location }
    }
}
