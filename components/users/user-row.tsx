import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '../../constants/theme';
import { messageOf } from '../../hooks/api-client';
import { ROLE_LABELS, type Role } from '../../shared/schemas/auth';
import type { ManagedUser, UpdateUserInput } from '../../shared/schemas/users';
import { Button } from '../ui/button';
import { ErrorBanner } from '../ui/error-banner';
import { SegmentedControl } from '../ui/segmented-control';
import { Text } from '../ui/text';
import { ROLE_OPTIONS } from './role-options';

export interface UserRowProps {
  user: ManagedUser;
  isSelf: boolean;
  onUpdate: (changes: UpdateUserInput) => Promise<unknown>;
}

type Pending = 'role' | 'active' | null;

export function UserRow({ user, isSelf, onUpdate }: UserRowProps) {
  const [editingRole, setEditingRole] = useState(false);
  const [draftRole, setDraftRole] = useState<Role>(user.role);
  const [pending, setPending] = useState<Pending>(null);
  const [failure, setFailure] = useState<string>();

  async function run(kind: Exclude<Pending, null>, changes: UpdateUserInput, after?: () => void) {
    setPending(kind);
    setFailure(undefined);
    try {
      await onUpdate(changes);
      after?.();
    } catch (error) {
      setFailure(messageOf(error));
    } finally {
      setPending(null);
    }
  }

  return (
    <View style={[styles.row, !user.active && styles.inactiveRow]}>
      <View style={styles.summary}>
        <View style={styles.identity}>
          <Text variant="bodyStrong">
            {user.name}
            {isSelf ? ' (you)' : ''}
          </Text>
          <Text tone="muted" selectable>
            {user.email}
          </Text>
        </View>
        <View style={styles.tags}>
          <View style={styles.tag}>
            <Text variant="label">{ROLE_LABELS[user.role]}</Text>
          </View>
          <View style={[styles.tag, user.active ? styles.activeTag : styles.inactiveTag]}>
            <Text variant="label" tone={user.active ? 'success' : 'muted'}>
              {user.active ? 'Active' : 'Inactive'}
            </Text>
          </View>
        </View>
      </View>

      {failure ? <ErrorBanner message={failure} /> : null}

      {editingRole ? (
        <View style={styles.editor}>
          <SegmentedControl
            label={`Role for ${user.name}`}
            options={ROLE_OPTIONS}
            value={draftRole}
            onChange={setDraftRole}
            disabled={pending === 'role'}
          />
          <View style={styles.actions}>
            <Button
              label="Save role"
              accessibilityLabel={`Save role for ${user.name}`}
              compact
              loading={pending === 'role'}
              disabled={draftRole === user.role}
              onPress={() => void run('role', { role: draftRole }, () => setEditingRole(false))}
            />
            <Button
              label="Cancel"
              accessibilityLabel={`Cancel role change for ${user.name}`}
              variant="ghost"
              compact
              onPress={() => {
                setEditingRole(false);
                setDraftRole(user.role);
                setFailure(undefined);
              }}
            />
          </View>
        </View>
      ) : (
        <View style={styles.actions}>
          <Button
            label="Change role"
            accessibilityLabel={`Change role for ${user.name}`}
            variant="secondary"
            compact
            onPress={() => {
              setDraftRole(user.role);
              setEditingRole(true);
            }}
          />
          {/* Switching off your own account would end your session mid-task; another admin can. */}
          {isSelf ? null : user.active ? (
            <Button
              label="Deactivate"
              accessibilityLabel={`Deactivate ${user.name}`}
              variant="ghost"
              compact
              loading={pending === 'active'}
              onPress={() => void run('active', { active: false })}
            />
          ) : (
            <Button
              label="Reactivate"
              accessibilityLabel={`Reactivate ${user.name}`}
              variant="secondary"
              compact
              loading={pending === 'active'}
              onPress={() => void run('active', { active: true })}
            />
          )}
        </View>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  row: {
    gap: spacing.md,
    paddingVertical: spacing.lg,
    borderBottomWidth: 1,
    borderBottomColor: colors.border,
  },
  inactiveRow: { opacity: 0.85 },
  summary: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', gap: spacing.sm },
  identity: { gap: spacing.xxs, flexShrink: 1, minWidth: 200 },
  tags: { flexDirection: 'row', gap: spacing.xs, alignItems: 'flex-start' },
  tag: {
    paddingHorizontal: spacing.sm,
    paddingVertical: spacing.xxs,
    borderRadius: radii.sm,
    backgroundColor: colors.surfaceSunken,
  },
  activeTag: { backgroundColor: colors.successSoft },
  inactiveTag: { backgroundColor: colors.surfaceSunken, borderWidth: 1, borderColor: colors.borderStrong },
  editor: { gap: spacing.md },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
