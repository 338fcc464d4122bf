// The page an invitation e-mail links to: what the invitation offers, then accept (signed in) or
// sign in / create an account and come back here to accept. Expired and used links say so.
import { StyleSheet, Text, View } from 'react-native';
import { useLocalSearchParams, useRouter } from 'expo-router';
import type { InvitationPreview } from '@/shared/api/groups';
import { useAcceptInvitation, useInvitationPreview } from '@/hooks/queries/useInvitations';
import { useSession } from '@/hooks/useSession';
import { isApiError, type ApiError } from '@/lib/api';
import { roleDescriptions } from '@/lib/role-descriptions';
import { AuthFrame } from '@/components/auth/AuthFrame';
import { Banner } from '@/components/ui/Banner';
import { LoadError } from '@/components/ui/LoadError';
import { Button } from '@/components/ui/Button';
import { RoleBadge } from '@/components/ui/RoleBadge';
import { colors, space, type } from '@/constants/theme';

export default function InvitationScreen() {
  const { token } = useLocalSearchParams<{ token: string }>();
  const preview = useInvitationPreview(token);

  if (preview.isPending) return <AuthFrame title="Invitation"><Text style={styles.muted}>Opening the invitation…</Text></AuthFrame>;
  if (preview.isError) {
    return (
      <AuthFrame title="Invitation">
        <LoadError error={preview.error} failed="Could not open the invitation"
          notFound={{ title: 'This invitation link is not valid', text: 'Check that the whole link was copied, or ask for a new invitation.' }} />
      </AuthFrame>
    );
  }
  return <Offer token={token} invitation={preview.data} />;
}

function Offer({ token, invitation }: { token: string; invitation: InvitationPreview }) {
  const router = useRouter();
  const session = useSession();
  const accept = useAcceptInvitation(token);
  const here = `/invite/${token}`;
  const authLink = (pathname: '/sign-in' | '/sign-up') => ({ pathname, params: { next: here, email: invitation.email } });

  const closed = invitation.status !== 'pending';
  return (
    <AuthFrame title={`Join ${invitation.groupName}`} lead={`${invitation.invitedBy} invited ${invitation.email} to this group on Overstrand.`}>
      <View style={styles.role}>
        <View style={styles.roleLine}>
          <Text style={styles.label}>Role</Text>
          <RoleBadge role={invitation.role} />
        </View>
        <Text style={styles.muted}>{roleDescriptions[invitation.role]}</Text>
      </View>

      {invitation.status === 'expired' ? (
        <Banner tone="error" title="This invitation has expired">
          Invitation links work for a limited time. Ask {invitation.invitedBy} to send a new one.
        </Banner>
      ) : null}
      {invitation.status === 'accepted' && !accept.isSuccess ? ( // after my own accept the refetched preview says accepted
        <Banner tone="error" title="This invitation was already used">
          Each link joins one person once. If that was you, sign in and open the group from Account.
        </Banner>
      ) : null}
      {accept.isError ? <AcceptError error={accept.error} /> : null}
      {accept.isSuccess ? (
        <Banner tone="success" title={`You joined ${accept.data.name}`}>Your role is {accept.data.role}.</Banner>
      ) : null}

      {accept.isSuccess ? (
        <Button label="Open the group" onPress={() => router.replace(`/account/groups/${accept.data.id}`)} />
      ) : closed ? null : session.status === 'signedIn' ? (
        <View style={styles.actions}>
          <Text style={styles.muted}>Signed in as {session.user?.displayName} ({session.user?.email}).</Text>
          <Button label="Accept and join" busyLabel="Joining…" busy={accept.isPending} onPress={() => accept.mutate()} />
        </View>
      ) : (
        <View style={styles.actions}>
          <Button label="Create an account to join" onPress={() => router.push(authLink('/sign-up'))} />
          <Button variant="secondary" label="I have an account: sign in" onPress={() => router.push(authLink('/sign-in'))} />
        </View>
      )}
    </AuthFrame>
  );
}

function AcceptError({ error }: { error: Error }) {
  const code = isApiError(error) ? (error as ApiError).code : null;
  const title =
    code === 'invitation_expired' ? 'This invitation has expired'
    : code === 'invitation_used' ? 'This invitation was already used'
    : code === 'already_member' ? 'You are already in this group'
    : 'Could not accept the invitation';
  return <Banner tone={code === 'already_member' ? 'info' : 'error'} title={title}>{error.message}</Banner>;
}

const styles = StyleSheet.create({
  role: { gap: space.xs + 2 },
  roleLine: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  label: { ...type.label, color: colors.ink },
  muted: { ...type.small, color: colors.inkMuted },
  actions: { gap: space.md },
});
