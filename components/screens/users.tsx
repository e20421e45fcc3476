import { StyleSheet, useWindowDimensions, View } from 'react-native';
import { CreateUserForm } from '../users/create-user-form';
import { UserList } from '../users/user-list';
import { Card } from '../ui/card';
import { EmptyState } from '../ui/empty-state';
import { ErrorBanner } from '../ui/error-banner';
import { LoadingState } from '../ui/loading-state';
import { Screen } from '../ui/screen';
import { Text } from '../ui/text';
import { layout, spacing } from '../../constants/theme';
import { messageOf } from '../../hooks/api-client';
import { useSessionQuery } from '../../hooks/use-session';
import { useCreateUserMutation, useUpdateUserMutation, useUsersQuery } from '../../hooks/use-users';
import { useScreenTitle } from '../ui/use-screen-title';

export default function UsersScreen() {
  const { data: me } = useSessionQuery();
  const isAdmin = me?.role === 'admin';
  const users = useUsersQuery(isAdmin);
  const createUser = useCreateUserMutation();
  const updateUser = useUpdateUserMutation();
  const twoColumns = useWindowDimensions().width >= layout.wideBreakpoint;

  useScreenTitle('Users');
  if (!me) return <LoadingState />;
  if (!isAdmin) {
    return (
      <Screen>
        <Text variant="title" headingLevel={1}>
          Users
        </Text>
        <EmptyState title="Only an admin manages users" message="Ask your shop's Dilato admin to add someone or change a role." />
      </Screen>
    );
  }

  return (
    <Screen wide>
      <View style={styles.header}>
        <Text variant="title" headingLevel={1}>
          Users
        </Text>
        <Text tone="muted">
          Everyone who signs in to Dilato, and what their role lets them do. Deactivating someone signs them out at once.
        </Text>
      </View>

      <View style={twoColumns ? styles.columns : styles.stack}>
        <View style={[styles.section, twoColumns && styles.listColumn]}>
          <Text variant="heading" headingLevel={2}>
            Team
          </Text>
          {users.isPending ? (
            <LoadingState label="Loading users…" />
          ) : users.isError ? (
            <ErrorBanner
              title="The user list did not load"
              message={messageOf(users.error)}
              onRetry={() => void users.refetch()}
            />
          ) : users.data.length === 0 ? (
            <EmptyState title="No users yet" message="Add the first person with the form." />
          ) : (
            <UserList
              users={users.data}
              currentUserId={me.id}
              onUpdate={(id, changes) => updateUser.mutateAsync({ id, changes })}
            />
          )}
        </View>
        <Card style={twoColumns ? styles.formColumn : undefined}>
          <Text variant="heading" headingLevel={2}>
            Add a user
          </Text>
          <CreateUserForm onSubmit={(values) => createUser.mutateAsync(values)} />
        </Card>
      </View>
    </Screen>
  );
}

const styles = StyleSheet.create({
  header: { gap: spacing.xs },
  section: { gap: spacing.sm },
  stack: { gap: spacing.xxl },
  columns: { flexDirection: 'row', alignItems: 'flex-start', gap: spacing.xl },
  listColumn: { flex: 3 },
  formColumn: { flex: 2 },
});
