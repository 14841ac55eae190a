import { ALERT_RULE_KEYS } from '@shared/schemas/mail';
import { Card } from '../../../components/ui/card';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { FirstThingsFirst } from '../../../components/ui/first-things-first';
import { Loading } from '../../../components/ui/loading';
import { useAlertRules } from '../api/get-alert-rules';
import { AlertRuleForm } from './alert-rule-form';

/** Who hears of an incident by e-mail, one rule per kind of incident. */
export function AlertRulesCard() {
  const rules = useAlertRules();
  return (
    <Card aria-labelledby="alert-rules-title" className="mb-8 flex flex-col">
      <h2 id="alert-rules-title" className="text-2xl font-bold">
        Incident alerts
      </h2>
      <p className="mt-1 text-ink-muted">
        Who gets an e-mail when an incident is reported. The mail says what kind of incident, where and when, with a
        link to the report; never the names of people or the description.
      </p>
      {/* The rules are named after the classes: what those classes are, and are not. */}
      <div className="mt-4">
        <FirstThingsFirst />
      </div>
      {rules.isPending && <Loading label="Loading the alert rules" />}
      {rules.isError && (
        <div className="mt-4">
          <ErrorNotice
            title={rules.data ? 'Could not reload the alert rules: these are as they were' : 'Could not load the alert rules'}
            error={rules.error}
            onRetry={() => rules.refetch()}
            retrying={rules.isFetching}
          />
        </div>
      )}
      {/* Kept through a refetch that fails on the arena Wi-Fi: a rule being changed stays as it is. */}
      {rules.data && (
        <div className="divide-y divide-line">
          {ALERT_RULE_KEYS.map((key) => {
            const rule = rules.data?.rules.find((each) => each.key === key);
            return rule && <AlertRuleForm key={key} rule={rule} />;
          })}
        </div>
      )}
    </Card>
  );
}
