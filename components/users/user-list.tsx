import { View } from 'react-native';
import type { ManagedUser, UpdateUserInput } from '../../shared/schemas/users';
import { UserRow } from './user-row';

export interface UserListProps {
  users: ManagedUser[];
  currentUserId: string;
  onUpdate: (id: string, changes: UpdateUserInput) => Promise<unknown>;
}

export function UserList({ users, currentUserId, onUpdate }: UserListProps) {
  return (
    <View accessibilityRole="list" aria-label="Users">
      {users.map((user) => (
        <View key={user.id} role="listitem">
          <UserRow user={user} isSelf={user.id === currentUserId} onUpdate={(changes) => onUpdate(user.id, changes)} />
        </View>
      ))}
    </View>
  );
}
