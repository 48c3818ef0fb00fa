import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { ROLES, ROLE_LABELS, type Role } from '@/modules/accounts/core/roles';
import { PASSWORD_MIN_LENGTH, newUserInput } from '@/modules/accounts/core/user-input';
import { SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { ChoiceGroup } from '@/modules/theme/ui/choice-group';
import { Notice } from '@/modules/theme/ui/notice';
import { TextField } from '@/modules/theme/ui/text-field';

import { graphProblem, problemWithoutField } from './graph-error';
import { useCreateUser } from './use-team';

type Field = 'email' | 'name' | 'role' | 'password';
const LABELS: Record<Field, string> = { email: 'E-mail', name: 'Name', role: 'Role', password: 'First password' };

/** A manager opens an account for someone new and hands them the first password. */
export function NewMemberForm() {
  const { createUser, creating } = useCreateUser();
  const [email, setEmail] = useState('');
  const [name, setName] = useState('');
  const [role, setRole] = useState<Role | null>(null);
  const [password, setPassword] = useState('');
  const [errors, setErrors] = useState<Partial<Record<Field | 'form', string>>>({});
  const [done, setDone] = useState<string | null>(null);

  const submit = async () => {
    setDone(null);
    const parsed = newUserInput.safeParse({ email, name, role: role ?? undefined, password });
    if (!parsed.success) {
      const found: Partial<Record<Field, string>> = {};
      for (const issue of parsed.error.issues) {
        const field = issue.path[0] as Field;
        found[field] ??= `${LABELS[field]} ${issue.message}`;
      }
      setErrors(found);
      return;
    }
    setErrors({});
    const result = await createUser(parsed.data);
    if (result.data?.createUser) {
      setDone(`${result.data.createUser.name} can now sign in as ${result.data.createUser.email}.`);
      setEmail('');
      setName('');
      setRole(null);
      setPassword('');
      return;
    }
    const problem = graphProblem(result.error);
    if (!problem) return;
    const field = problem.field as Field | undefined;
    if (field && field in LABELS) setErrors({ [field]: `${LABELS[field]} ${problemWithoutField(problem)}` });
    else setErrors({ form: problem.message });
  };

  return (
    <View role="form" aria-label="Add a person" style={styles.form}>
      {done ? <Notice tone="success">{done}</Notice> : null}
      {errors.form ? <Notice tone="error">{errors.form}</Notice> : null}
      <TextField label="Name" value={name} onChangeText={setName} error={errors.name} autoComplete="off" testID="new-member-name" />
      <TextField label="E-mail" value={email} onChangeText={setEmail} error={errors.email} inputMode="email" autoCapitalize="none" autoComplete="off" testID="new-member-email" />
      <ChoiceGroup label="Role" options={ROLES} labels={ROLE_LABELS} value={role} onChange={setRole} error={errors.role} testID="new-member-role" />
      <TextField
        label="First password"
        hint={`At least ${PASSWORD_MIN_LENGTH} characters. Hand it over in person.`}
        value={password}
        onChangeText={setPassword}
        error={errors.password}
        secureTextEntry
        autoComplete="new-password"
        autoCapitalize="none"
        testID="new-member-password"
      />
      <View style={styles.buttons}>
        <Button label="Add to the team" onPress={submit} busy={creating} testID="new-member-submit" />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: SPACE.lg },
  buttons: { flexDirection: 'row' },
});
