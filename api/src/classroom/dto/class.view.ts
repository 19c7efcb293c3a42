import { ApiProperty } from '@nestjs/swagger';
import {
  CLASS_SHARING_TERMS,
  type BakingClass,
  type ClassInvite,
  type ClassInviteListResponse,
  type ClassInviteStatus,
  type ClassJoinPreview,
  type ClassListResponse,
  type ClassMember,
  type ClassMemberListResponse,
  type ClassPerson,
  type ClassRole,
  type CreateClassInvitesResponse,
} from '@peakwise/shared';

// Documents the Classroom shapes (shared/src/contracts/classroom.ts) in the OpenAPI reference.

export class ClassPersonView implements ClassPerson {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ example: 'Ines Marlow' }) displayName: string;
}

export class BakingClassView implements BakingClass {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ example: 'Weekend Levain' }) name: string;
  @ApiProperty() description: string;
  @ApiProperty({ format: 'date' }) startsOn: string;
  @ApiProperty({ format: 'date' }) endsOn: string;
  @ApiProperty({ type: ClassPersonView }) instructor: ClassPersonView;
  @ApiProperty({ enum: ['instructor', 'student'], description: 'The viewer’s relation to the class' })
  role: ClassRole;
  @ApiProperty({ description: 'Students who have not left' }) memberCount: number;
  @ApiProperty({
    type: String,
    nullable: true,
    example: 'K7QW3MXP',
    description: 'Only for the instructor; null when joining by code is off',
  })
  joinCode: string | null;
  @ApiProperty({ format: 'date-time' }) createdAt: string;
  @ApiProperty({ format: 'date-time' }) updatedAt: string;
}

export class ClassListView implements ClassListResponse {
  @ApiProperty({ type: [BakingClassView] }) items: BakingClassView[];
  @ApiProperty() total: number;
  @ApiProperty() limit: number;
  @ApiProperty() offset: number;
}

export class ClassMemberView implements ClassMember {
  @ApiProperty({ format: 'uuid', description: 'The student’s account id' }) id: string;
  @ApiProperty({ example: 'Theo Park' }) displayName: string;
  @ApiProperty({ example: 'theo@example.com' }) email: string;
  @ApiProperty({ format: 'date-time', description: 'Start of the current membership' }) joinedAt: string;
}

export class ClassMemberListView implements ClassMemberListResponse {
  @ApiProperty({ type: [ClassMemberView] }) items: ClassMemberView[];
  @ApiProperty() total: number;
  @ApiProperty() limit: number;
  @ApiProperty() offset: number;
}

export class ClassInviteView implements ClassInvite {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ example: 'amara@example.com' }) email: string;
  @ApiProperty({ enum: ['pending', 'accepted', 'expired', 'revoked'] }) status: ClassInviteStatus;
  @ApiProperty({ format: 'date-time' }) createdAt: string;
  @ApiProperty({ format: 'date-time' }) expiresAt: string;
  @ApiProperty({ type: String, format: 'date-time', nullable: true }) acceptedAt: string | null;
}

export class CreateClassInvitesView implements CreateClassInvitesResponse {
  @ApiProperty({ type: [ClassInviteView] }) invites: ClassInviteView[];
}

export class ClassInviteListView implements ClassInviteListResponse {
  @ApiProperty({ type: [ClassInviteView] }) items: ClassInviteView[];
  @ApiProperty() total: number;
  @ApiProperty() limit: number;
  @ApiProperty() offset: number;
}

export class ClassJoinPreviewView implements ClassJoinPreview {
  @ApiProperty() name: string;
  @ApiProperty() description: string;
  @ApiProperty({ format: 'date' }) startsOn: string;
  @ApiProperty({ format: 'date' }) endsOn: string;
  @ApiProperty({ example: 'Ines Marlow' }) instructorName: string;
  @ApiProperty({ type: [String], example: [...CLASS_SHARING_TERMS], description: 'What joining shares' })
  shares: string[];
  @ApiProperty({ description: 'The viewer is already a current member' }) alreadyMember: boolean;
}
