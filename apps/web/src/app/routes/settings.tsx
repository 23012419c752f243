import { ErrorPanel } from "@/components/errors/error-panel";
import { useSettings } from "@/features/settings/api/get-settings";
import { SettingsForm } from "@/features/settings/components/settings-form";

export function SettingsRoute() {
  const settings = useSettings();
  return (
    <div className="flex flex-col gap-6">
      <header>
        <h1 className="text-3xl font-semibold text-spruce">Settings</h1>
        <p className="mt-1 max-w-prose text-ink-soft">
          The rules your team's studies start from. Every change is recorded in the audit trail.
        </p>
      </header>
      {settings.isPending && <p className="text-ink-soft">Loading the settings…</p>}
      {settings.error && (
        <ErrorPanel title="The settings could not be loaded" message={settings.error.message} />
      )}
      {settings.data && <SettingsForm settings={settings.data} />}
    </div>
  );
}
